import { exactTorqueFree } from '../motion/exact-torque-free';

const DEG = Math.PI / 180;

/**
 * Time (s) from the start until spin about the intermediate axis first turns the part over — the
 * first zero of the intermediate component of ω — from the exact elliptic solution (Landau &
 * Lifshitz §37; K(m) by the AGM), and the interval between successive flips (half the ω period).
 *
 * Frames and units: principal frame, moments I1 ≥ I2 ≥ I3 (kg·m²), rate (rad/s), `axisInBody` the
 * intended axis's components along the principal axes (unit), misalignment in degrees.
 * The start is the intended axis itself if it is at least `misalignmentDeg` from the intermediate
 * axis; otherwise the intermediate axis tilted by `misalignmentDeg` toward the intended axis's
 * offset (or toward the major axis when there is none). Returns nulls when the moments are not
 * distinct or the start lies exactly on the separatrix.
 */
export function intermediateFlipTime(
  moments: ArrayLike<number>,
  axisInBody: ArrayLike<number>,
  rate: number,
  misalignmentDeg: number,
): { flipTime: number | null; flipInterval: number | null } {
  const s = axisInBody[1] >= 0 ? 1 : -1;
  let w0: number[];
  const perp = Math.hypot(axisInBody[0], axisInBody[2]);
  const geometric = Math.atan2(perp, Math.abs(axisInBody[1]));
  if (geometric >= misalignmentDeg * DEG) {
    w0 = [rate * axisInBody[0], rate * axisInBody[1], rate * axisInBody[2]];
  } else {
    const tx = perp > 1e-12 ? axisInBody[0] / perp : 1;
    const tz = perp > 1e-12 ? axisInBody[2] / perp : 0;
    const c = Math.cos(misalignmentDeg * DEG),
      sn = Math.sin(misalignmentDeg * DEG);
    w0 = [rate * sn * tx, rate * s * c, rate * sn * tz];
  }
  const exact = exactTorqueFree(moments, w0);
  if (!exact || !Number.isFinite(exact.period)) return { flipTime: null, flipInterval: null };
  return { flipTime: exact.firstIntermediateCrossing(), flipInterval: exact.period / 2 };
}

/**
 * Near-separatrix (logarithmic) form of the quarter period: K(m) ≈ ln(4/k′) as k′ → 0
 * (DLMF 19.12.1), so the time to the first flip from the top of the cycle is about ln(4/k′)/λ.
 * Inputs: growth rate λ (1/s) and the complementary modulus k′ = √(1 − m).
 */
export function flipTimeNearSeparatrix(growthRate: number, kPrime: number): number {
  return Math.log(4 / kPrime) / growthRate;
}
