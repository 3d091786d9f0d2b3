import { exactTorqueFree } from '../motion/exact-torque-free';
import type { PrincipalAxes } from '../principal/principal-axes';
import { classifySpin, type AxisRole } from './classify-spin';
import { explainSpin } from './explain-spin';
import type { FlightTime, FlightTimeSource } from './flight-time';
import { firstReversal } from './flip-time';
import { intermediateGrowthRate } from './growth-rate';
import { motionShape, type MotionAxis } from './motion-axis';
import { spinVerdict } from './spin-verdict';
import { nearestIndex, statedStart } from './stated-start';
import { DEFAULT_VERDICT_THRESHOLDS, type Verdict, type VerdictThresholds } from './verdict-thresholds';
import { wobblePeriod } from './wobble-period';

export type { AxisRole, MotionAxis, FlightTimeSource };

/** The spin part of a spin report (SI: rad/s, 1/s, s; angles in degrees). */
export interface SpinAssessment {
  nearestAxis: AxisRole;
  /** Angle between the intended axis and the nearest principal axis (or the plane of an equal pair), degrees. */
  misalignmentDeg: number;
  /** Follows the motion (motionAxis), the flight time and the rules of VerdictThresholds. */
  verdict: Verdict;
  /** major = (I1 − I2)/I2, minor = (I2 − I3)/I2. */
  margins: { major: number; minor: number };
  /** λ (1/s) for an intermediate axis, else null. */
  growthRate: number | null;
  /** 1/λ (s) for an intermediate axis, else null. */
  eFoldingTime: number | null;
  /** Predicted time to the first turn-over from the stated start (s), when the part turns over; else null. */
  flipTime: number | null;
  /** 2π/wobblePeriod (rad/s) when the motion stays about the nearest (major or minor) axis; 0 with no restoring wobble (equal moments); else null. */
  wobbleFrequency: number | null;
  /** The principal axis the body-frame angular momentum circles from the stated start, or the separatrix (from G² against 2T·I2). */
  motionAxis: MotionAxis;
  /** Largest angle of the angular momentum from motionAxis over the motion, in the body (degrees); null on the separatrix. */
  coneHalfAngleDeg: number | null;
  /** Period of the body-frame motion from the exact solution (s): the polhode closes once; null where it does not repeat. */
  wobblePeriod: number | null;
  /** Time in the air the flip is compared with (s), or null when unknown. */
  flightTime: number | null;
  /** Where flightTime comes from: the part document, or its category's common practice estimate. */
  flightTimeSource: FlightTimeSource;
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
  /** Time in the air and where it comes from (resolveFlightTime); default unknown. */
  flight?: FlightTime;
}

const ROLE_INDEX: Record<AxisRole, 0 | 1 | 2> = { major: 0, intermediate: 1, minor: 2 };
const ROLES: readonly AxisRole[] = ['major', 'intermediate', 'minor'];
const NO_FLIGHT: FlightTime = { flightTime: null, source: null, categoryDefault: null };

/**
 * The verdict for spin about an intended axis, following the motion that actually happens: from the
 * stated start (statedStart: the intended axis, at least `misalignmentDeg` from its nearest principal
 * axis) the conserved G² and 2T say which axis the motion circles (motionShape), the exact solution
 * gives the wobble period and the first turn-over, and a turn-over after the flight ends is not seen.
 * Margins, growth rate and a plain-language explanation come with it, and notes (the major-axis
 * rule for a dissipative part whose motion circles its minor axis).
 */
export function assessSpin(input: SpinInput): { spin: SpinAssessment; notes: string[] } {
  const t = { ...DEFAULT_VERDICT_THRESHOLDS, ...input.thresholds };
  const flight = input.flight ?? NO_FLIGHT;
  const I = input.principal.moments;
  const [i1, i2, i3] = [I[0], I[1], I[2]];
  const margins = { major: (i1 - i2) / i2, minor: (i2 - i3) / i2 };
  const rate = input.rate;
  const c = classifySpin(input.principal, input.axis, input.dissipative, t);
  const { nearestAxis, misalignmentDeg } = c;
  const equalPairs = input.principal.equalPairs;
  // With an equal pair the nearest role names the pair, not one axis: take the nearest single axis there.
  const about = c.neutral || c.spherical ? nearestIndex(c.inBody) : ROLE_INDEX[nearestAxis];
  const w0 = statedStart(c.inBody, rate, input.misalignmentDeg, about);
  const shape = motionShape(I, equalPairs, w0);
  const exact = equalPairs[0] || equalPairs[1] ? null : exactTorqueFree(I, w0);
  const period = wobblePeriod(I, shape, w0, exact);
  const turnsOver = !c.spherical && !c.neutral && (nearestAxis === 'intermediate' || shape.motionAxis !== nearestAxis);

  let growthRate: number | null = null,
    flipTime: number | null = null,
    wobble: number | null = null;
  if (nearestAxis === 'intermediate' && !c.neutral && !c.spherical) growthRate = intermediateGrowthRate(i1, i2, i3, rate);
  if (turnsOver) flipTime = exact ? firstReversal(exact, ROLE_INDEX[nearestAxis]) : null;
  else if (c.spherical || c.neutral) wobble = 0;
  else wobble = period !== null ? (2 * Math.PI) / period : null;
  const flipInterval = turnsOver && period !== null ? period / 2 : null;

  const verdict = spinVerdict({
    spin: c,
    motionAxis: shape.motionAxis,
    turnsOver,
    flipTime,
    flightTime: flight.flightTime,
    dissipative: input.dissipative,
    thresholds: t,
  });
  const explanation = explainSpin({
    nearestAxis,
    misalignmentDeg,
    statedMisalignmentDeg: input.misalignmentDeg,
    spherical: c.spherical,
    neutral: c.neutral,
    closeness: c.closeness,
    margins,
    motionAxis: shape.motionAxis,
    coneHalfAngleDeg: shape.coneHalfAngleDeg,
    symmetryAxis: shape.symmetryAxis === null ? null : ROLES[shape.symmetryAxis],
    wobblePeriod: period,
    turnsOver,
    growthRate,
    flipTime,
    flipInterval,
    flight,
    thresholds: t,
  });
  const notes: string[] = [];
  if (input.dissipative && shape.motionAxis === 'minor') {
    notes.push(
      'Major-axis rule: this part is marked dissipative (it flexes or carries loose or liquid content) and its spin circles its minor axis. ' +
        'Internal losses keep the angular momentum but drain energy, so over time the spin drifts to the major axis.',
    );
  }
  return {
    spin: {
      nearestAxis,
      misalignmentDeg,
      verdict,
      margins,
      growthRate,
      eFoldingTime: growthRate !== null && growthRate > 0 ? 1 / growthRate : null,
      flipTime,
      wobbleFrequency: wobble,
      motionAxis: shape.motionAxis,
      coneHalfAngleDeg: shape.coneHalfAngleDeg,
      wobblePeriod: period,
      flightTime: flight.flightTime,
      flightTimeSource: flight.source,
      explanation,
    },
    notes,
  };
}
