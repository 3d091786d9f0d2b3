import { exactTorqueFree, type ExactTorqueFree } from '../motion/exact-torque-free';
import { statedStart } from './stated-start';

/**
 * Time (s) from the start until spin about the intermediate axis first turns the part over — the
 * first zero of the intermediate component of ω — from the exact elliptic solution (Landau &
 * Lifshitz §37; K(m) by the AGM), and the interval between successive flips (half the ω period).
 *
 * Frames and units: principal frame, moments I1 ≥ I2 ≥ I3 (kg·m²), rate (rad/s), `axisInBody` the
 * intended axis's components along the principal axes (unit), misalignment in degrees.
 * The start is the intended axis itself if it is at least `misalignmentDeg` from the intermediate
 * axis; otherwise the intermediate axis tilted by `misalignmentDeg` toward the intended axis's
 * offset (or toward the major axis when there is none) — statedStart. Returns nulls when the moments
 * are not distinct or the start lies exactly on the separatrix.
 */
export function intermediateFlipTime(
  moments: ArrayLike<number>,
  axisInBody: ArrayLike<number>,
  rate: number,
  misalignmentDeg: number,
): { flipTime: number | null; flipInterval: number | null } {
  const exact = exactTorqueFree(moments, statedStart(axisInBody, rate, misalignmentDeg, 1));
  if (!exact || !Number.isFinite(exact.period)) return { flipTime: null, flipInterval: null };
  return { flipTime: exact.firstIntermediateCrossing(), flipInterval: exact.period / 2 };
}

/**
 * Time (s) of the first sign change, strictly after t = 0, of the body-frame ω component along the
 * principal axis `index` (into the moments as given to exactTorqueFree): the moment the part has
 * turned over about that axis relative to its angular momentum. In the elliptic solution (Landau &
 * Lifshitz §37) the intermediate component goes as sn(u), zero at u = 2nK; the component along the
 * outer axis the motion does not circle as cn(u), zero at u = (2n + 1)K; the circled one as dn(u),
 * which never vanishes (null). u = ν·t + u0.
 */
export function firstReversal(exact: ExactTorqueFree, index: number): number | null {
  const K = exact.quarter;
  if (index === exact.circledAxis || !Number.isFinite(K)) return null;
  const shift = index === exact.intermediateAxis ? 0 : K;
  const n = Math.floor((exact.u0 - shift) / (2 * K)) + 1;
  return (2 * K * n + shift - exact.u0) / exact.nu;
}

/**
 * Near-separatrix (logarithmic) form of the quarter period: K(m) ≈ ln(4/k′) as k′ → 0
 * (DLMF 19.12.1), so the time to the first flip from the top of the cycle is about ln(4/k′)/λ.
 * Inputs: growth rate λ (1/s) and the complementary modulus k′ = √(1 − m).
 */
export function flipTimeNearSeparatrix(growthRate: number, kPrime: number): number {
  return Math.log(4 / kPrime) / growthRate;
}
