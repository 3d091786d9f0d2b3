import type { PrincipalAxes } from '../principal/principal-axes';
import { intermediateFlipTime } from './flip-time';
import { intermediateGrowthRate } from './growth-rate';
import { classifySpin, type AxisRole } from './classify-spin';
import { DEFAULT_VERDICT_THRESHOLDS, type Verdict, type VerdictThresholds } from './verdict-thresholds';
import { wobbleFrequency } from './wobble-frequency';

export type { AxisRole };

/** The spin part of a spin report (SI: rad/s, 1/s, s; angles in degrees). */
export interface SpinAssessment {
  nearestAxis: AxisRole;
  /** Angle between the intended axis and the nearest principal axis (or the plane of an equal pair), degrees. */
  misalignmentDeg: number;
  verdict: Verdict;
  /** major = (I1 − I2)/I2, minor = (I2 − I3)/I2. */
  margins: { major: number; minor: number };
  /** λ (1/s) for an intermediate axis, else null. */
  growthRate: number | null;
  /** 1/λ (s) for an intermediate axis, else null. */
  eFoldingTime: number | null;
  /** Predicted time to the first flip from the stated misalignment (s), intermediate axis only. */
  flipTime: number | null;
  /** Body-frame wobble angular frequency (rad/s) for a major or minor axis, else null. */
  wobbleFrequency: number | null;
  /** Plain-language explanation for the UI. */
  explanation: string;
}

/** What assessSpin needs. */
export interface SpinInput {
  principal: PrincipalAxes;
  /** Intended axis, unit, part coordinates. */
  axis: ArrayLike<number>;
  /** rad/s */
  rate: number;
  /** Stated small misalignment for the flip prediction, degrees. */
  misalignmentDeg: number;
  dissipative: boolean;
  thresholds?: Partial<VerdictThresholds>;
}

const fmt = (x: number, digits = 3) => Number(x.toPrecision(digits)).toString();
const pct = (x: number) => `${fmt(100 * x, 3)} %`;

/**
 * The verdict for spin about an intended axis, with margins, growth rate, flip time, wobble and a
 * plain-language explanation, following the rules of VerdictThresholds (documented there).
 * Also returns notes (the major-axis rule for a dissipative part about its minor axis).
 */
export function assessSpin(input: SpinInput): { spin: SpinAssessment; notes: string[] } {
  const t = { ...DEFAULT_VERDICT_THRESHOLDS, ...input.thresholds };
  const I = input.principal.moments;
  const [i1, i2, i3] = [I[0], I[1], I[2]];
  const margins = { major: (i1 - i2) / i2, minor: (i2 - i3) / i2 };
  const notes: string[] = [];
  const rate = input.rate;
  const c = classifySpin(input.principal, input.axis, input.dissipative, t);
  const { nearestAxis, misalignmentDeg, verdict, inBody: b } = c;
  let growthRate: number | null = null,
    eFoldingTime: number | null = null,
    flipTime: number | null = null,
    wobble: number | null = null;
  let explanation: string;
  if (c.spherical) {
    wobble = 0;
    explanation =
      'All three principal moments are equal (spherical inertia): every axis is a principal axis and spin about any of them stays as it is.';
  } else if (c.neutral) {
    wobble = 0;
    explanation =
      `The intended axis lies ${fmt(misalignmentDeg, 2)}° from the plane of two equal principal moments. ` +
      'Spin there is neutral: it does not flip over, but nothing pulls it back either, so a small disturbance makes the part drift slowly about its symmetry axis.';
  } else if (nearestAxis === 'intermediate') {
    growthRate = intermediateGrowthRate(i1, i2, i3, rate);
    eFoldingTime = 1 / growthRate;
    const f = intermediateFlipTime(I, b, rate, input.misalignmentDeg);
    flipTime = f.flipTime;
    explanation =
      `The intended axis is ${fmt(misalignmentDeg, 2)}° from the intermediate principal axis. Spin about it is unstable: ` +
      `a small misalignment grows e-fold every ${fmt(eFoldingTime)} s (growth rate ${fmt(growthRate)} 1/s)` +
      (flipTime !== null
        ? `, and from a ${fmt(Math.max(input.misalignmentDeg, misalignmentDeg), 2)}° misalignment the part turns over after about ${fmt(flipTime)} s, then again every ${fmt(f.flipInterval!)} s.`
        : '.') +
      ' To make it steady, move the moment about this axis clearly above or below the other two.';
  } else {
    const r = nearestAxis === 'major' ? 0 : 2;
    const [j, k] = r === 0 ? [i2, i3] : [i1, i2];
    wobble = wobbleFrequency(I[r], j, k, rate);
    const reasons: string[] = [];
    if (c.closeness < t.watchMomentFraction) reasons.push(`the moment about it is within ${pct(c.closeness)} of the intermediate moment`);
    if (misalignmentDeg > t.watchMisalignmentDeg) reasons.push(`it is ${fmt(misalignmentDeg, 2)}° away from the ${nearestAxis} axis`);
    explanation =
      `The intended axis is ${fmt(misalignmentDeg, 2)}° from the ${nearestAxis} principal axis, about which spin is steady: ` +
      `a small misalignment makes the part wobble at ${fmt(wobble / (2 * Math.PI))} Hz in its own frame without growing. ` +
      `Margin to the intermediate moment: ${pct(r === 0 ? margins.major : margins.minor)}.` +
      (reasons.length > 0 ? ` Watch it: ${reasons.join(', and ')}; tolerances or a flexing part could change its behaviour.` : '');
  }
  if (input.dissipative && nearestAxis === 'minor') {
    notes.push(
      'Major-axis rule: this part is marked dissipative (it flexes or carries loose or liquid content) and spins about its minor axis. ' +
        'Internal losses keep the angular momentum but drain energy, so over time the spin drifts to the major axis.',
    );
  }
  return {
    spin: { nearestAxis, misalignmentDeg, verdict, margins, growthRate, eFoldingTime, flipTime, wobbleFrequency: wobble, explanation },
    notes,
  };
}
