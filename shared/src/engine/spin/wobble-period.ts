import type { ExactTorqueFree } from '../motion/exact-torque-free';
import type { MotionShape } from './motion-axis';

/**
 * Period (s) after which the body-frame motion repeats — the polhode closes once — for the start
 * `omega0` (rad/s, principal frame, moments I1 ≥ I2 ≥ I3 in kg·m²). Null where the motion does not
 * repeat (the separatrix, a permanent rotation, spherical inertia).
 *
 * - Three distinct moments: 4K(k)/ν of the exact elliptic solution (Landau & Lifshitz, Mechanics,
 *   §37), passed in as `exact`. For a small cone it tends to 2π/ν with the small-angle wobble
 *   frequency ν = ω·√((Ii − Ij)(Ii − Ik)/(Ij·Ik)) (wobbleFrequency).
 * - A symmetric top (one equal pair, unique axis u, pair moment I⊥): ω precesses about u in the body
 *   at Ω = ω_u·(I_u − I⊥)/I⊥ (Landau & Lifshitz §33; Goldstein, Classical Mechanics, §5.6), so the
 *   period is 2π/|Ω| — exact at any cone angle.
 */
export function wobblePeriod(
  moments: ArrayLike<number>,
  shape: MotionShape,
  omega0: ArrayLike<number>,
  exact: ExactTorqueFree | null,
): number | null {
  if (shape.circled === null) return null;
  const u = shape.symmetryAxis;
  if (u !== null) {
    const iPerp = 0.5 * (moments[(u + 1) % 3] + moments[(u + 2) % 3]);
    const precession = Math.abs((omega0[u] * (moments[u] - iPerp)) / iPerp);
    return precession > 0 ? (2 * Math.PI) / precession : null;
  }
  if (!exact || !(Number.isFinite(exact.period) && exact.period > 0)) return null;
  return exact.period;
}
