import type { SpinReport } from '@tumblewise/engine';
import type { PartDocument } from '@tumblewise/shared';
import { PREVIEW_SAMPLE_BUDGET, tumbleRequest } from './tumble-request';

const doc = (rate: number) =>
  ({ primitives: [], spin: { axis: [1, 0, 0], rate, misalignmentDeg: 1 }, dissipative: false }) as unknown as PartDocument;
const report = (growthRate: number | null) => ({ spin: { growthRate } }) as unknown as SpinReport;

describe('tumbleRequest', () => {
  it('covers about three flips of an intermediate-axis spin at 24 samples per turn', () => {
    // λ = 0.48038446 /s at ω = 1 rad/s for I = (6.5, 5, 2.5) (MECHANICS.md §4); at 1° the
    // misalignment reaches order one after ln(1/θ)/λ ≈ 8.4 s.
    const r = tumbleRequest(doc(1), report(0.48038446), 1);
    expect(r.seconds).toBeGreaterThanOrEqual(3 * (Math.log(180 / Math.PI) / 0.48038446) - 0.01);
    expect(r.sampleRate * 2 * Math.PI).toBeGreaterThanOrEqual(24 * 0.999); // samples per turn at 1 rad/s … at least 30 /s here
    expect(r.sampleRate).toBeGreaterThanOrEqual(30);
    expect(r.misalignmentDeg).toBe(1);
  });

  it('shows twelve turns of a steady spin, sampled finely', () => {
    const rate = 31.4;
    const r = tumbleRequest(doc(rate), report(null), 1);
    const period = (2 * Math.PI) / rate;
    expect(r.seconds).toBeGreaterThanOrEqual(Math.max(2, 12 * period) - 1e-3);
    expect(r.sampleRate * period).toBeGreaterThanOrEqual(24 - 1e-2);
  });

  it('runs past the end of the flight, so the flight mark shows on the time axis', () => {
    const withFlight = (flightTime: number | null) => ({ spin: { growthRate: null, flightTime } }) as unknown as SpinReport;
    expect(tumbleRequest(doc(31.4), withFlight(30), 1).seconds).toBeGreaterThanOrEqual(30 * 1.25 - 1e-3);
    expect(tumbleRequest(doc(31.4), withFlight(null), 1).seconds).toBe(tumbleRequest(doc(31.4), report(null), 1).seconds);
    expect(tumbleRequest(doc(31.4), withFlight(600), 1).seconds).toBeLessThanOrEqual(120);
  });

  it('stays within the sample budget for a fast spin, keeping at least 8 samples per turn', () => {
    const rate = 600; // rad/s
    const r = tumbleRequest(doc(rate), report(0.002 * rate), 0.1);
    expect(r.seconds * r.sampleRate).toBeLessThanOrEqual(PREVIEW_SAMPLE_BUDGET);
    expect((r.sampleRate * 2 * Math.PI) / rate).toBeGreaterThanOrEqual(8 - 1e-2);
  });

  it('never asks for more than the engine’s 2000 samples/s, and keeps more than two samples per turn', () => {
    const rate = 2000;
    const r = tumbleRequest(doc(rate), report(0.5 * rate), 1);
    expect(r.sampleRate).toBeLessThanOrEqual(2000);
    expect((r.sampleRate * 2 * Math.PI) / rate).toBeGreaterThan(2);
    expect(r.seconds * r.sampleRate).toBeLessThanOrEqual(PREVIEW_SAMPLE_BUDGET);
  });
});
