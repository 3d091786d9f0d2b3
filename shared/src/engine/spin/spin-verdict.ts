import type { SpinClass } from './classify-spin';
import type { MotionAxis } from './motion-axis';
import { worseVerdict, type Verdict, type VerdictThresholds } from './verdict-thresholds';

/** What the verdict is decided from. */
export interface VerdictBasis {
  /** The intended axis and its nearest principal axis (classifySpin). */
  spin: Pick<SpinClass, 'nearestAxis' | 'misalignmentDeg' | 'neutral' | 'spherical' | 'closeness'>;
  /** The axis the motion from the stated start circles (motionShape). */
  motionAxis: MotionAxis;
  /** The spin does not stay about the intended axis: the part turns over. */
  turnsOver: boolean;
  /** First turn-over (s), when one is predicted. */
  flipTime: number | null;
  /** Time in the air (s), when known. */
  flightTime: number | null;
  dissipative: boolean;
  /** Complete thresholds (DEFAULT_VERDICT_THRESHOLDS merged). */
  thresholds: VerdictThresholds;
}

/**
 * The verdict following the actual motion (rules of VerdictThresholds): spherical inertia is
 * `steady`; the plane of an equal pair is neutral; a part that turns over is `flip-prone`, or
 * `watch` when its first turn-over comes after the flight ends (MECHANICS §8: a flip after landing
 * is not seen); spin that stays about its axis is `steady` unless close to the intermediate moment or
 * far from the axis (`watch`). A dissipative part whose motion circles the minor axis is at least
 * `dissipativeMinorVerdict` (the major-axis rule).
 */
export function spinVerdict(b: VerdictBasis): Verdict {
  const t = b.thresholds;
  let verdict: Verdict;
  if (b.spin.spherical) verdict = 'steady';
  else if (b.spin.neutral) verdict = t.neutralVerdict;
  else if (b.turnsOver) verdict = b.flipTime !== null && b.flightTime !== null && b.flipTime > b.flightTime ? 'watch' : 'flip-prone';
  else verdict = b.spin.closeness < t.watchMomentFraction || b.spin.misalignmentDeg > t.watchMisalignmentDeg ? 'watch' : 'steady';
  if (b.dissipative && b.motionAxis === 'minor') verdict = worseVerdict(verdict, t.dissipativeMinorVerdict);
  return verdict;
}
