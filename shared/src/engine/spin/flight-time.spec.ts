import { GEAR_CATEGORIES } from '../../schemas/projects';
import { validatePartDocument } from '../part/validate-part-document';
import { createPrincipalAxes, type PrincipalAxes } from '../principal/principal-axes';
import { analyzePart } from '../report/analyze-part';
import { assessSpin } from './assess-spin';
import { FLIGHT_TIME_DEFAULTS } from './flight-time-defaults';
import { resolveFlightTime } from './flight-time';

function principal(m: [number, number, number]): PrincipalAxes {
  const p = createPrincipalAxes();
  p.moments.set(m);
  p.axes.set([1, 0, 0, 0, 1, 0, 0, 0, 1]);
  return p;
}

// An invented practice block spun about its middle edge: a box 0.3 × 0.2 × 0.1 m has its
// intermediate moment about y (I ∝ b² + c², Machinery's Handbook box formula).
const block = (extra: Record<string, unknown> = {}) => ({
  name: 'Practice block',
  primitives: [{ id: 'block', shape: 'box', size: [0.3, 0.2, 0.1], density: 500 }],
  spin: { axis: [0, 1, 0], rate: 2 },
  ...extra,
});

describe('flight time (MECHANICS §8: a flip after the flight ends is not seen)', () => {
  it('every category but "other" has a default, each marked a common practice estimate and within the schema’s 600 s', () => {
    for (const category of GEAR_CATEGORIES) {
      const d = FLIGHT_TIME_DEFAULTS[category];
      if (category === 'other') {
        expect(d).toBeNull();
        continue;
      }
      expect(d?.basis).toBe('common practice estimate');
      expect(d!.seconds).toBeGreaterThan(0);
      expect(d!.seconds).toBeLessThanOrEqual(600);
    }
  });

  it("the part's own flight time wins over its category's estimate; neither gives none", () => {
    expect(resolveFlightTime(2, 'javelin')).toMatchObject({ flightTime: 2, source: 'part' });
    expect(resolveFlightTime(undefined, 'javelin')).toMatchObject({
      flightTime: FLIGHT_TIME_DEFAULTS.javelin!.seconds,
      source: 'category default',
    });
    expect(resolveFlightTime(undefined, 'other')).toEqual({ flightTime: null, source: null, categoryDefault: null });
    expect(resolveFlightTime(undefined, undefined).source).toBeNull();
  });

  it('a flip predicted after the flight ends gives watch, saying when it flips and how long the gear is in the air', () => {
    const base = { principal: principal([6.5, 5, 2.5]), axis: [0, 1, 0], rate: 1, misalignmentDeg: 1, dissipative: false };
    const unseen = assessSpin({ ...base, flight: { flightTime: 1, source: 'part', categoryDefault: null } }).spin;
    expect(unseen.flipTime).toBeGreaterThan(1);
    expect(unseen.verdict).toBe('watch');
    expect(unseen.flightTime).toBe(1);
    expect(unseen.flightTimeSource).toBe('part');
    expect(unseen.explanation).toContain(`flips after ${Number(unseen.flipTime!.toPrecision(3))} s; the gear is in the air about 1 s`);
    const seen = assessSpin({ ...base, flight: { flightTime: 60, source: 'part', categoryDefault: null } }).spin;
    expect(seen.verdict).toBe('flip-prone');
    expect(seen.explanation).toMatch(/the flip happens in flight/);
    const unknown = assessSpin(base).spin;
    expect(unknown.verdict).toBe('flip-prone');
    expect(unknown.flightTimeSource).toBeNull();
  });

  it('the category default is used, reported as such and shown as a common practice estimate', () => {
    const r = analyzePart(block({ category: 'juggling' })).spin;
    expect(r.nearestAxis).toBe('intermediate');
    expect(r.flightTime).toBe(FLIGHT_TIME_DEFAULTS.juggling!.seconds);
    expect(r.flightTimeSource).toBe('category default');
    expect(r.flipTime).toBeGreaterThan(r.flightTime!);
    expect(r.verdict).toBe('watch');
    expect(r.explanation).toContain('common practice estimate');
    expect(r.explanation).not.toMatch(/memory/i);
    // A faster spin flips within the same flight.
    expect(analyzePart(block({ category: 'juggling', spin: { axis: [0, 1, 0], rate: 40 } })).spin.verdict).toBe('flip-prone');
  });

  it("the part's own flight time is used and marked 'part'; no category, no flight time", () => {
    const own = analyzePart(block({ category: 'juggling', flightTime: 30 })).spin;
    expect(own).toMatchObject({ flightTime: 30, flightTimeSource: 'part', verdict: 'flip-prone' });
    expect(analyzePart(block()).spin).toMatchObject({ flightTime: null, flightTimeSource: null, verdict: 'flip-prone' });
  });

  it.each([
    [0, 'must be greater than zero'],
    [-1, 'must be greater than zero'],
    [601, 'must be at most 600 s'],
    ['soon', 'must be a number'],
  ])('refuses flightTime %p with the path "flightTime"', (flightTime, message) => {
    const r = validatePartDocument(block({ flightTime }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([{ path: 'flightTime', message }]);
  });

  it('accepts a flight time up to 600 s, and none', () => {
    const r = validatePartDocument(block({ flightTime: 600 }));
    expect(r.ok && r.value.flightTime).toBe(600);
    const none = validatePartDocument(block());
    expect(none.ok && none.value.flightTime).toBeUndefined();
  });
});
