import type { PrincipalAxes } from '../principal/principal-axes';
import { worseVerdict, type Verdict, type VerdictThresholds } from './verdict-thresholds';

/** Role of a principal axis. */
export type AxisRole = 'major' | 'intermediate' | 'minor';

/** Role and verdict of an intended spin axis, without explanation (cheap enough for scatter loops). */
export interface SpinClass {
  nearestAxis: AxisRole;
  /** Degrees from the nearest principal axis, or from the plane of an equal pair. */
  misalignmentDeg: number;
  verdict: Verdict;
  /** Spin lies in the plane of two equal moments. */
  neutral: boolean;
  /** All three moments equal. */
  spherical: boolean;
  /** |I_spin − I2| / I2 for the moment about the intended axis. */
  closeness: number;
  /** Intended axis components along the principal axes. */
  inBody: [number, number, number];
}

const DEG = 180 / Math.PI;

/**
 * The rules of VerdictThresholds applied to principal axes and an intended unit axis (part frame).
 * `thresholds` must be complete (merge DEFAULT_VERDICT_THRESHOLDS first).
 */
export function classifySpin(principal: PrincipalAxes, axis: ArrayLike<number>, dissipative: boolean, t: VerdictThresholds): SpinClass {
  const { moments: I, axes: P, equalPairs } = principal;
  const b: [number, number, number] = [0, 0, 0];
  for (let r = 0; r < 3; r++) b[r] = P[3 * r] * axis[0] + P[3 * r + 1] * axis[1] + P[3 * r + 2] * axis[2];
  const angleTo = (r: number) => Math.acos(Math.min(1, Math.abs(b[r]))) * DEG;
  const angleToPlaneOf = (normalRow: number) => Math.asin(Math.min(1, Math.abs(b[normalRow]))) * DEG;
  const iSpin = I[0] * b[0] * b[0] + I[1] * b[1] * b[1] + I[2] * b[2] * b[2];
  const closeness = Math.abs(iSpin - I[1]) / I[1];
  let nearestAxis: AxisRole;
  let misalignmentDeg: number;
  let neutral = false;
  const spherical = equalPairs[0] && equalPairs[1];
  if (spherical) {
    nearestAxis = 'major';
    misalignmentDeg = 0;
  } else if (equalPairs[0]) {
    const toPair = angleToPlaneOf(2),
      toMinor = angleTo(2);
    neutral = toPair <= toMinor;
    nearestAxis = neutral ? 'major' : 'minor';
    misalignmentDeg = Math.min(toPair, toMinor);
  } else if (equalPairs[1]) {
    const toPair = angleToPlaneOf(0),
      toMajor = angleTo(0);
    neutral = toPair < toMajor;
    nearestAxis = neutral ? 'minor' : 'major';
    misalignmentDeg = Math.min(toPair, toMajor);
  } else {
    const a0 = angleTo(0),
      a1 = angleTo(1),
      a2 = angleTo(2);
    if (a1 <= a0 && a1 <= a2) {
      nearestAxis = 'intermediate';
      misalignmentDeg = a1;
    } else if (a0 <= a2) {
      nearestAxis = 'major';
      misalignmentDeg = a0;
    } else {
      nearestAxis = 'minor';
      misalignmentDeg = a2;
    }
  }
  let verdict: Verdict;
  if (spherical) verdict = 'steady';
  else if (neutral) verdict = t.neutralVerdict;
  else if (nearestAxis === 'intermediate') verdict = 'flip-prone';
  else verdict = closeness < t.watchMomentFraction || misalignmentDeg > t.watchMisalignmentDeg ? 'watch' : 'steady';
  if (dissipative && nearestAxis === 'minor') verdict = worseVerdict(verdict, t.dissipativeMinorVerdict);
  return { nearestAxis, misalignmentDeg, verdict, neutral, spherical, closeness, inBody: b };
}
