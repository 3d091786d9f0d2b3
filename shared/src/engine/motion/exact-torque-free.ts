import { completeEllipticK } from './complete-elliptic-k';
import { incompleteEllipticF } from './incomplete-elliptic-f';
import { jacobiSnCnDn } from './jacobi-elliptic';

/**
 * The exact torque-free motion of a rigid body with three distinct principal moments, in the body's
 * principal frame: ω components are Jacobi elliptic functions (Landau & Lifshitz, Mechanics, §37).
 * With the moments relabelled (a, b, c) so that b is the intermediate axis and c the axis the polhode
 * circles (the major axis when G² > 2T·I_b, else the minor one):
 *   ω_a = A cn(u), ω_b = ±B sn(u), ω_c = ±C dn(u),  u = ν t + u0,
 *   A² = (2T I_c − G²)/(I_a(I_c − I_a)),  B² = (2T I_c − G²)/(I_b(I_c − I_b)),  C² = (G² − 2T I_a)/(I_c(I_c − I_a)),
 *   ν² = (I_c − I_b)(G² − 2T I_a)/(I_a I_b I_c),  m = (I_b − I_a)(2T I_c − G²)/((I_c − I_b)(G² − 2T I_a)).
 * Each G² − 2T·I_k is formed as Σ L_i²(I_i − I_k)/I_i, free of cancellation, and the complementary
 * parameter as mc = (I_c − I_a)(G² − 2T I_b)/((I_c − I_b)(G² − 2T I_a)), so the near-separatrix case
 * (the flip-time case, m → 1) keeps its accuracy. The initial phase u0 comes from F(φ0 | m).
 */
export interface ExactTorqueFree {
  /** Elliptic parameter m = k² and its complement 1 − m. */
  readonly m: number;
  readonly mc: number;
  /** Rate of the elliptic argument ν (1/s) and the initial argument u0. */
  readonly nu: number;
  readonly u0: number;
  /** Quarter period K(m) of the argument. */
  readonly quarter: number;
  /** Period of ω in the body frame, 4K/ν (s); the body flips every half period. */
  readonly period: number;
  /** Index (into the moments as given) of the axis the polhode circles. */
  readonly circledAxis: number;
  /** Index of the intermediate axis. */
  readonly intermediateAxis: number;
  /** out = ω(t) in the principal frame, components in the order the moments were given (rad/s). */
  omegaAt(t: number, out?: Float64Array): Float64Array;
  /** Time of the first zero of the intermediate component ω_b strictly after t = 0 (s). */
  firstIntermediateCrossing(): number;
}

const EVEN = new Set(['0,1,2', '1,2,0', '2,0,1']);

/**
 * Builds the exact solution for principal moments `moments` (kg·m², any order, all distinct) and the
 * initial body angular velocity `omega0` (rad/s, principal frame, same order). Returns null on the
 * separatrix itself (G² = 2T·I_b exactly, where the period is infinite) or with two equal moments.
 */
export function exactTorqueFree(moments: ArrayLike<number>, omega0: ArrayLike<number>): ExactTorqueFree | null {
  const idx = [0, 1, 2].sort((i, j) => moments[i] - moments[j]);
  const [lo, mid, hi] = idx;
  if (!(moments[lo] < moments[mid] && moments[mid] < moments[hi])) return null;
  const L = [moments[0] * omega0[0], moments[1] * omega0[1], moments[2] * omega0[2]];
  const gap = (k: number) => {
    let s = 0;
    for (let i = 0; i < 3; i++) if (i !== k) s += (L[i] * L[i] * (moments[i] - moments[k])) / moments[i];
    return s;
  }; // G² − 2T·I_k
  const dMid = gap(mid);
  if (dMid === 0) return null;
  const c = dMid > 0 ? hi : lo;
  const a = dMid > 0 ? lo : hi;
  const b = mid;
  const Ia = moments[a],
    Ib = moments[b],
    Ic = moments[c];
  const Da = gap(a),
    Dc = gap(c),
    Db = dMid;
  const A = Math.sqrt(-Dc / (Ia * (Ic - Ia)));
  const B = Math.sqrt(-Dc / (Ib * (Ic - Ib)));
  const C = Math.sqrt(Da / (Ic * (Ic - Ia)));
  const nu = Math.sqrt(((Ic - Ib) * Da) / (Ia * Ib * Ic));
  const m = ((Ib - Ia) * -Dc) / ((Ic - Ib) * Da);
  const mc = ((Ic - Ia) * Db) / ((Ic - Ib) * Da);
  // An odd relabelling flips the sign of Euler's equations; negating ω_a restores the even form.
  const parity = EVEN.has(`${a},${b},${c}`) ? 1 : -1;
  const eps = Ic > Ib ? 1 : -1;
  const sc = omega0[c] >= 0 ? 1 : -1;
  const sb = eps * sc;
  const wa = parity * omega0[a];
  const cn0 = A > 0 ? clamp(wa / A) : 1;
  const sn0 = B > 0 ? clamp(omega0[b] / (sb * B)) : 0;
  const phi0 = Math.atan2(sn0, cn0);
  const u0 = incompleteEllipticF(phi0, m, mc);
  const K = completeEllipticK(m, mc);
  const scratch = new Float64Array(3);
  return {
    m,
    mc,
    nu,
    u0,
    quarter: K,
    period: (4 * K) / nu,
    circledAxis: c,
    intermediateAxis: b,
    omegaAt(t: number, out = new Float64Array(3)) {
      jacobiSnCnDn(scratch, nu * t + u0, m, mc);
      out[a] = parity * A * scratch[1];
      out[b] = sb * B * scratch[0];
      out[c] = sc * C * scratch[2];
      return out;
    },
    firstIntermediateCrossing() {
      const n = Math.floor(u0 / (2 * K)) + 1;
      return (2 * K * n - u0) / nu;
    },
  };
}

function clamp(x: number): number {
  return x > 1 ? 1 : x < -1 ? -1 : x;
}
