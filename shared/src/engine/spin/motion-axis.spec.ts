import fc from 'fast-check';
import { exactTorqueFree } from '../motion/exact-torque-free';
import { simulate } from '../motion/simulate';
import {
  createPrincipalAxes,
  EQUAL_MOMENTS_ANALYTIC,
  EQUAL_MOMENTS_MESH,
  principalAxes,
  type PrincipalAxes,
} from '../principal/principal-axes';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { assessSpin } from './assess-spin';
import { motionShape } from './motion-axis';
import { wobbleFrequency } from './wobble-frequency';
import { wobblePeriod } from './wobble-period';

const DEG = Math.PI / 180;

function principal(m: [number, number, number], equal: [boolean, boolean] = [false, false]): PrincipalAxes {
  const p = createPrincipalAxes();
  p.moments.set(m);
  p.axes.set([1, 0, 0, 0, 1, 0, 0, 0, 1]);
  p.equalPairs = equal;
  return p;
}

/** The intended axis `deg` from the minor axis e3, toward the major axis e1. */
const fromMinor = (deg: number): [number, number, number] => [Math.sin(deg * DEG), 0, Math.cos(deg * DEG)];

/** Sign changes of body-frame L component `r` along a simulated polhode, and the largest angle (deg) from axis `c`. */
function polhodeFacts(sim: { times: number[]; polhode: [number, number, number][] }, r: number, c: number) {
  const crossings: number[] = [];
  let widest = 0;
  for (let k = 0; k < sim.times.length; k++) {
    const p = sim.polhode[k];
    widest = Math.max(widest, Math.acos(Math.min(1, Math.abs(p[c]))) / DEG);
    if (k > 0 && Math.sign(p[r]) !== Math.sign(sim.polhode[k - 1][r])) crossings.push(sim.times[k]);
  }
  return { crossings, widest };
}

describe('the motion at any misalignment (G² against 2T·I2: Landau & Lifshitz, Mechanics, §37; Goldstein, Classical Mechanics, §5.6)', () => {
  const I: [number, number, number] = [6.5, 5, 2.5];

  it('a spin 44° from the minor axis circles the major axis: not "minor, steady", and the small-angle wobble figure would be 51 % high', () => {
    const { spin } = assessSpin({ principal: principal(I), axis: fromMinor(44), rate: 1, misalignmentDeg: 1, dissipative: false });
    expect(spin.nearestAxis).toBe('minor');
    expect(spin.motionAxis).toBe('major');
    expect(spin.verdict).toBe('flip-prone');
    expect(spin.explanation).toMatch(/circles the major axis/);
    expect(spin.explanation).not.toMatch(/steady/);
    expect(spin.wobbleFrequency).toBeNull();
    // The small-angle frequency about the minor axis against the exact period of the motion that happens.
    const smallAngle = wobbleFrequency(I[2], I[0], I[1], 1);
    expectAbsClose(smallAngle / ((2 * Math.PI) / spin.wobblePeriod!), 1.51, 0.005);
  });

  it('the labels, cone and first turn-over of that case match an independent integration (Lie–Poisson splitting) of the same start', () => {
    const { spin } = assessSpin({ principal: principal(I), axis: fromMinor(44), rate: 1, misalignmentDeg: 1, dissipative: false });
    // 44° is more than the stated 1°, so the start is the intended axis itself: misalignment 0 in simulate.
    const sim = simulate({ moments: I, axis: fromMinor(44), rate: 1, misalignmentDeg: 0, seconds: 40, sampleRate: 200 });
    const major = polhodeFacts(sim, 0, 0);
    const minor = polhodeFacts(sim, 2, 0);
    expect(major.crossings).toEqual([]); // L never leaves the major axis's side: it circles that axis
    expect(minor.crossings.length).toBeGreaterThanOrEqual(4); // the minor-axis component keeps changing sign: end over end
    expectAbsClose(major.widest, spin.coneHalfAngleDeg!, 1e-4);
    expectAbsClose(minor.crossings[0], spin.flipTime!, 0.005 + 1e-6);
    expectAbsClose(minor.crossings[2] - minor.crossings[0], spin.wobblePeriod!, 0.01 + 1e-6);
  });

  it('property: the axis named is the one whose body-frame L component never changes sign in the integrated motion', () => {
    const moments = fc
      .tuple(
        fc.double({ min: 1, max: 10, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9, noNaN: true }),
      )
      .map(([a, f, g]) => [a, a * f, a * f * g] as [number, number, number])
      .filter(([a, b, c]) => (a - b) / a > 0.05 && (b - c) / a > 0.05);
    const direction = fc
      .tuple(
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
      )
      .filter((d) => Math.min(...d.map(Math.abs)) > 0.05 * Math.hypot(...d)); // off every axis, so each non-circled component moves
    fc.assert(
      fc.property(moments, direction, (m, d) => {
        const n = Math.hypot(...d);
        const w0 = d.map((x) => x / n);
        const shape = motionShape(m, [false, false], w0);
        const exact = exactTorqueFree(m, w0);
        if (!exact || shape.circled === null || !(exact.period < 200)) return; // too close to the separatrix to integrate a period
        expect(shape.circled).toBe(exact.circledAxis);
        const sampleRate = Math.min(2000, 4000 / exact.period);
        const sim = simulate({ moments: m, axis: d, rate: 1, misalignmentDeg: 0, seconds: 1.2 * exact.period, sampleRate });
        const other = 2 - shape.circled;
        expect(polhodeFacts(sim, shape.circled, shape.circled).crossings).toEqual([]);
        expect(polhodeFacts(sim, other, shape.circled).crossings.length).toBeGreaterThan(0);
        expectAbsClose(polhodeFacts(sim, other, shape.circled).widest, shape.coneHalfAngleDeg!, 0.2);
      }),
      { numRuns: 25, seed: 20261205 },
    );
  });

  it('exact wobble period: the MECHANICS check value I = (3, 2, 1), ω0 = (1, 0, 0.3) gives 6.3311214 s about the major axis', () => {
    const w0 = [1, 0, 0.3];
    const shape = motionShape([3, 2, 1], [false, false], w0);
    expect(shape.motionAxis).toBe('major');
    expectAbsClose(wobblePeriod([3, 2, 1], shape, w0, exactTorqueFree([3, 2, 1], w0))!, 6.3311214, 5e-8);
  });

  it('the exact wobble period tends to the small-angle 2π/ν, with an error falling as the square of the cone angle', () => {
    const nu = wobbleFrequency(I[0], I[1], I[2], 10); // linearised Euler equations, Landau & Lifshitz §37
    const relErr = (deg: number) =>
      assessSpin({ principal: principal(I), axis: [1, 0, 0], rate: 10, misalignmentDeg: deg, dissipative: false }).spin.wobblePeriod! /
        ((2 * Math.PI) / nu) -
      1;
    expect(Math.abs(relErr(1e-3))).toBeLessThan(1e-9);
    expect(Math.abs(relErr(1))).toBeGreaterThan(1e-5); // a real difference at 1°, not the formula again
    expectRelClose(relErr(2) / relErr(1), 4, 2e-3);
    const minor = assessSpin({ principal: principal(I), axis: [0, 0, 1], rate: 10, misalignmentDeg: 1e-3, dissipative: false }).spin;
    expectRelClose(minor.wobbleFrequency!, wobbleFrequency(I[2], I[0], I[1], 10), 1e-9);
  });

  it('spin near the intermediate axis: the motion circles an outer axis with a cone near 90°, and the flip time is unchanged', () => {
    const { spin } = assessSpin({ principal: principal(I), axis: [0, 1, 0], rate: 1, misalignmentDeg: 1, dissipative: false });
    expect(spin.nearestAxis).toBe('intermediate');
    expect(spin.motionAxis).toBe('major'); // the stated start tilts toward the major axis
    expect(spin.coneHalfAngleDeg).toBeGreaterThan(88);
    expect(spin.coneHalfAngleDeg).toBeLessThan(90);
    const sim = simulate({ moments: I, axis: 'intermediate', rate: 1, misalignmentDeg: 1, seconds: 12, sampleRate: 200 });
    expectAbsClose(spin.flipTime!, sim.flipTime!, 1e-12);
    expectAbsClose(polhodeFacts(sim, 1, 0).crossings[0], spin.flipTime!, 0.005 + 1e-6);
  });

  it('a free symmetric top precesses about its unique axis at Ω = ω3(I3 − I⊥)/I⊥ at any cone (Landau & Lifshitz §33)', () => {
    const top = principal([5, 5, 1], [true, false]);
    const { spin } = assessSpin({ principal: top, axis: fromMinor(30), rate: 10, misalignmentDeg: 1, dissipative: false });
    expect(spin.motionAxis).toBe('minor');
    expect(spin.verdict).toBe('watch'); // 30° from its axis (VerdictThresholds.watchMisalignmentDeg)
    const omega3 = 10 * Math.cos(30 * DEG);
    expectRelClose(spin.wobblePeriod!, (2 * Math.PI) / Math.abs((omega3 * (1 - 5)) / 5), 1e-12);
    expectAbsClose(spin.coneHalfAngleDeg!, Math.atan(5 * Math.tan(30 * DEG)) / DEG, 1e-9); // L = Iω: tan θ_L = (I⊥/I3) tan θ_ω
    const sim = simulate({ moments: [5, 5, 1], axis: fromMinor(30), rate: 10, misalignmentDeg: 0, seconds: 3, sampleRate: 2000 });
    const facts = polhodeFacts(sim, 0, 2);
    expectAbsClose(facts.crossings[2] - facts.crossings[0], spin.wobblePeriod!, 2e-3);
  });

  it('two moments equal within the mesh tolerance (1e-6 relative): a slow neutral precession, not an exponential flip', () => {
    const tensor = [5, 0, 0, 0, 5 * (1 - 3e-7), 0, 0, 0, 1];
    const asMesh = principalAxes(createPrincipalAxes(), tensor, EQUAL_MOMENTS_MESH);
    expect(asMesh.equalPairs).toEqual([true, false]);
    const { spin } = assessSpin({ principal: asMesh, axis: [0, 1, 0], rate: 10, misalignmentDeg: 1, dissipative: false });
    expect(spin.verdict).toBe('watch');
    expect(spin.growthRate).toBeNull();
    expect(spin.flipTime).toBeNull();
    expect(spin.motionAxis).toBe('separatrix');
    expect(spin.explanation).toMatch(/slow neutral precession, not an exponential flip/);
    // The same tensor as an analytic part (1e-9) has three distinct moments: an exponential flip, at a tiny rate.
    const asAnalytic = principalAxes(createPrincipalAxes(), tensor, EQUAL_MOMENTS_ANALYTIC);
    const distinct = assessSpin({ principal: asAnalytic, axis: [0, 1, 0], rate: 10, misalignmentDeg: 1, dissipative: false }).spin;
    expect(distinct.verdict).toBe('flip-prone');
    expect(distinct.growthRate).toBeLessThan(0.02);
  });

  it('the major-axis rule note follows the axis the motion circles, not the nearest one', () => {
    const far = assessSpin({ principal: principal(I), axis: fromMinor(44), rate: 1, misalignmentDeg: 1, dissipative: true });
    expect(far.spin.motionAxis).toBe('major');
    expect(far.notes).toEqual([]);
    const near = assessSpin({ principal: principal(I), axis: fromMinor(5), rate: 1, misalignmentDeg: 1, dissipative: true });
    expect(near.spin.motionAxis).toBe('minor');
    expect(near.spin.verdict).toBe('watch');
    expect(near.notes.join(' ')).toMatch(/Major-axis rule/);
  });
});
