import { simulate } from '@tumblewise/engine';
import { Quaternion, Vector3 } from 'three';
import { attitudeAt, trackDuration, trackPosition, turnOvers, vectorAt, type Track } from './attitude-track';

/** A body turning at a constant rate about a fixed axis: the exact attitude is an axis-angle rotation (three.js setFromAxisAngle as the reference). */
function steadyTurn(axis: Vector3, rate: number, samples: number, dt: number, flipSigns = false): Track {
  const times = Array.from({ length: samples }, (_, k) => k * dt);
  const attitude = times.map((t, k) => {
    const q = new Quaternion().setFromAxisAngle(axis, rate * t);
    // q and −q are the same rotation; the interpolation must not care which one is stored.
    const s = flipSigns && k % 2 === 1 ? -1 : 1;
    return [s * q.x, s * q.y, s * q.z, s * q.w] as [number, number, number, number];
  });
  return { times, attitude, omega: times.map(() => [0, 0, rate]), polhode: times.map(() => [0, 0, 1]) };
}

const angleBetween = (a: Quaternion, b: Quaternion) => a.angleTo(b);

describe('trackPosition', () => {
  const times = [0, 0.1, 0.2, 0.3];
  it('finds the earlier sample and the fraction toward the next', () => {
    const p = trackPosition(times, 0.25);
    expect(p.index).toBe(2);
    expect(p.fraction).toBeCloseTo(0.5, 12);
    expect(trackPosition(times, 0.1)).toEqual({ index: 1, fraction: 0 });
  });
  it('holds at the ends', () => {
    expect(trackPosition(times, -1)).toEqual({ index: 0, fraction: 0 });
    expect(trackPosition(times, 0.3)).toEqual({ index: 3, fraction: 0 });
    expect(trackPosition(times, 9)).toEqual({ index: 3, fraction: 0 });
  });
  it('refuses an empty simulation', () => {
    expect(() => trackPosition([], 0)).toThrow(RangeError);
  });
});

describe('attitudeAt', () => {
  const axis = new Vector3(1, 2, 2).normalize();
  const rate = 2 * Math.PI * 5; // 5 rev/s
  const dt = 1 / 120; // 24 samples per turn

  it('reproduces a steady turn between samples (slerp is exact for a fixed axis and rate)', () => {
    const track = steadyTurn(axis, rate, 121, dt);
    for (const t of [0.0031, 0.4567, 0.99]) {
      const exact = new Quaternion().setFromAxisAngle(axis, rate * t);
      expect(angleBetween(attitudeAt(new Quaternion(), track, t), exact)).toBeLessThan(1e-6);
    }
  });

  it('ignores the sign of the stored quaternions', () => {
    const track = steadyTurn(axis, rate, 121, dt, true);
    const t = 0.5 + dt / 3;
    const exact = new Quaternion().setFromAxisAngle(axis, rate * t);
    expect(angleBetween(attitudeAt(new Quaternion(), track, t), exact)).toBeLessThan(1e-6);
  });

  it('writes into out and returns it, also when it already holds an attitude', () => {
    const track = steadyTurn(axis, rate, 121, dt);
    const out = new Quaternion(0.5, 0.5, 0.5, 0.5);
    expect(attitudeAt(out, track, 0)).toBe(out);
    expect(angleBetween(out, new Quaternion())).toBeLessThan(1e-9);
  });

  it('keeps the angular momentum fixed in space along a real torque-free motion', () => {
    // The engine's simulation (Lie–Poisson splitting) of I = (6.5, 5, 2.5) about the intermediate axis
    // (MECHANICS.md §4 check values). In space L = q·(I ω)_body; attitude is part → space and the body
    // frame is the principal frame, so L_space = attitude · (Pᵀ·(I ω)) with P the principal rows.
    const sim = simulate({ moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 1, misalignmentDeg: 2, seconds: 20, sampleRate: 30 });
    const P = sim.axes;
    const L0 = new Vector3(...sim.angularMomentum[0]);
    const q = new Quaternion();
    for (const t of [3.01, 7.77, 12.345, 19.99]) {
      const w = vectorAt([0, 0, 0], sim.omega, sim.times, t);
      const body = [0, 1, 2].map((i) => sim.moments[i] * w[i]);
      const part = new Vector3(
        P[0][0] * body[0] + P[1][0] * body[1] + P[2][0] * body[2],
        P[0][1] * body[0] + P[1][1] * body[1] + P[2][1] * body[2],
        P[0][2] * body[0] + P[1][2] * body[1] + P[2][2] * body[2],
      );
      const space = part.applyQuaternion(attitudeAt(q, sim, t));
      // Interpolating between samples 1/30 s apart is good to the square of the step.
      expect(space.distanceTo(L0) / L0.length()).toBeLessThan(5e-3);
    }
  });
});

describe('vectorAt and trackDuration', () => {
  it('interpolates linearly and reports the last sample time', () => {
    const times = [0, 1, 2];
    const series = [
      [0, 0, 0],
      [1, 2, 3],
      [3, 2, 1],
    ];
    expect(vectorAt([0, 0, 0], series, times, 1.5)).toEqual([2, 2, 2]);
    expect(trackDuration({ times })).toBe(2);
    expect(trackDuration({ times: [] })).toBe(0);
  });
});

describe('turnOvers', () => {
  // Euler's theorem on torque-free rotation (common practice in mechanics): spin about the
  // intermediate axis is unstable and turns over; spin about the major or minor axis is not.
  it('counts the flips of an intermediate-axis spin and none for a major-axis spin', () => {
    const flipping = simulate({ moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 1, misalignmentDeg: 1, seconds: 60, sampleRate: 20 });
    expect(turnOvers(flipping.polhode, 1)).toBeGreaterThanOrEqual(2);
    const steady = simulate({ moments: [6.5, 5, 2.5], axis: 'major', rate: 1, misalignmentDeg: 5, seconds: 60, sampleRate: 20 });
    expect(turnOvers(steady.polhode, 0)).toBe(0);
  });

  it('skips values inside the dead band', () => {
    expect(
      turnOvers(
        [
          [0, 1, 0],
          [0, 0.01, 0],
          [0, -0.01, 0],
          [0, 1, 0],
        ],
        1,
      ),
    ).toBe(0);
    expect(
      turnOvers(
        [
          [0, 1, 0],
          [0, -1, 0],
          [0, 1, 0],
        ],
        1,
      ),
    ).toBe(2);
  });
});
