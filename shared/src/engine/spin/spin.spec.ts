import { createPrincipalAxes, type PrincipalAxes } from '../principal/principal-axes';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { completeEllipticK } from '../motion/complete-elliptic-k';
import { assessSpin } from './assess-spin';
import { flipTimeNearSeparatrix, intermediateFlipTime } from './flip-time';
import { growthPerRevolution, intermediateGrowthRate } from './growth-rate';
import { wobbleFrequency } from './wobble-frequency';

function principal(m: [number, number, number], equal: [boolean, boolean] = [false, false]): PrincipalAxes {
  const p = createPrincipalAxes();
  p.moments.set(m);
  p.axes.set([1, 0, 0, 0, 1, 0, 0, 0, 1]);
  p.equalPairs = equal;
  return p;
}

describe('linearised Euler equations (Landau & Lifshitz, Mechanics, §37)', () => {
  it('growth rate λ = ω√((I1−I2)(I2−I3)/(I1I3)): I = (6.5, 5, 2.5), ω = 1 → 0.48038446 (MECHANICS check value)', () => {
    expectAbsClose(intermediateGrowthRate(6.5, 5, 2.5, 1), 0.48038446, 5e-9);
    expectRelClose(growthPerRevolution(6.5, 5, 2.5), Math.exp(2 * Math.PI * 0.48038446), 1e-8);
    expect(intermediateGrowthRate(5, 5, 2.5, 1)).toBe(0);
  });

  it('wobble ν = ω√((Ii−Ij)(Ii−Ik)/(IjIk)): same I, ω = 1 → 0.69282032 about the major axis, 0.55470020 about the minor axis', () => {
    expectAbsClose(wobbleFrequency(6.5, 5, 2.5, 1), 0.69282032, 5e-9);
    expectAbsClose(wobbleFrequency(2.5, 6.5, 5, 1), 0.5547002, 5e-9);
  });
});

describe('flip time from the exact elliptic period', () => {
  it('approaches the near-separatrix logarithmic form ln(4/k′)/λ as the misalignment shrinks (DLMF 19.12.1)', () => {
    const I = [6.5, 5, 2.5],
      rate = 1;
    const lambda = intermediateGrowthRate(6.5, 5, 2.5, rate);
    for (const deg of [1e-2, 1e-4]) {
      const { flipTime } = intermediateFlipTime(I, [0, 1, 0], rate, deg);
      // Starting on top of the cycle, the first flip is one quarter period: K(m)/ν with ν → λ.
      const d = (deg * Math.PI) / 180;
      const w = [Math.sin(d), Math.cos(d), 0];
      const L = w.map((x, i) => x * I[i]);
      const g = (k: number) => L.reduce((s, l, i) => s + (l * l * (I[i] - I[k])) / I[i], 0);
      const mc = ((I[0] - I[2]) * g(1)) / ((I[0] - I[1]) * g(2));
      expectRelClose(flipTime!, flipTimeNearSeparatrix(lambda, Math.sqrt(mc)), deg === 1e-4 ? 1e-6 : 1e-3);
      expect(completeEllipticK(1 - mc, mc)).toBeGreaterThan(3);
    }
  });

  it('a larger stated misalignment gives an earlier flip, and none on two equal moments', () => {
    const early = intermediateFlipTime([6.5, 5, 2.5], [0, 1, 0], 10, 5).flipTime!;
    const late = intermediateFlipTime([6.5, 5, 2.5], [0, 1, 0], 10, 0.5).flipTime!;
    expect(early).toBeLessThan(late);
    expect(intermediateFlipTime([5, 5, 2.5], [0, 1, 0], 10, 1).flipTime).toBeNull();
  });
});

describe('assessSpin verdicts (thresholds documented in VerdictThresholds)', () => {
  const base = { rate: 10, misalignmentDeg: 1, dissipative: false };
  it('intermediate axis → flip-prone with growth rate, e-folding time and flip time', () => {
    const { spin } = assessSpin({ ...base, principal: principal([6.5, 5, 2.5]), axis: [0, 1, 0] });
    expect(spin.nearestAxis).toBe('intermediate');
    expect(spin.verdict).toBe('flip-prone');
    expectRelClose(spin.growthRate!, 4.8038446, 1e-8);
    expectRelClose(spin.eFoldingTime!, 1 / 4.8038446, 1e-8);
    expect(spin.flipTime).toBeGreaterThan(0);
    expect(spin.wobbleFrequency).toBeNull();
    expectRelClose(spin.margins.major, 0.3, 1e-15);
    expectRelClose(spin.margins.minor, 0.5, 1e-15);
    expect(spin.explanation).toMatch(/unstable/);
  });

  it('major axis with margin → steady with a wobble; close to the intermediate moment → watch', () => {
    const steady = assessSpin({ ...base, principal: principal([6.5, 5, 2.5]), axis: [1, 0, 0] }).spin;
    expect(steady.verdict).toBe('steady');
    // Exact frequency from the stated 1° start: the small-angle 6.9282032 (MECHANICS check value) to O(θ²).
    expectRelClose(steady.wobbleFrequency!, 6.9282032, 2e-4);
    expectRelClose(steady.wobbleFrequency!, (2 * Math.PI) / steady.wobblePeriod!, 1e-15);
    expect(steady.growthRate).toBeNull();
    const close = assessSpin({ ...base, principal: principal([5.2, 5, 2.5]), axis: [1, 0, 0] }).spin;
    expect(close.verdict).toBe('watch');
    // Configurable: a 3 % threshold lets the 4 % margin pass.
    expect(
      assessSpin({ ...base, principal: principal([5.2, 5, 2.5]), axis: [1, 0, 0], thresholds: { watchMomentFraction: 0.03 } }).spin.verdict,
    ).toBe('steady');
  });

  it('a misalignment beyond 10° from the nearest (stable) axis → watch', () => {
    const a = (15 * Math.PI) / 180;
    const { spin } = assessSpin({ ...base, principal: principal([6.5, 5, 2.5]), axis: [Math.cos(a), 0, Math.sin(a)] });
    expect(spin.nearestAxis).toBe('major');
    expectAbsClose(spin.misalignmentDeg, 15, 1e-12);
    expect(spin.verdict).toBe('watch');
  });

  it('spin in the plane of two equal moments is neutral: not flip-prone', () => {
    const { spin } = assessSpin({ ...base, principal: principal([5, 5, 1], [true, false]), axis: [0, 1, 0] });
    expect(spin.verdict).toBe('watch');
    expect(spin.growthRate).toBeNull();
    expect(spin.explanation).toMatch(/neutral/);
  });

  it('dissipative part about its minor axis: major-axis-rule note and at least watch', () => {
    const r = assessSpin({ ...base, dissipative: true, principal: principal([6.5, 5, 2.5]), axis: [0, 0, 1] });
    expect(r.spin.nearestAxis).toBe('minor');
    expect(r.spin.verdict).toBe('watch');
    expect(r.notes.join(' ')).toMatch(/Major-axis rule/);
    expect(assessSpin({ ...base, principal: principal([6.5, 5, 2.5]), axis: [0, 0, 1] }).notes).toEqual([]);
  });
});
