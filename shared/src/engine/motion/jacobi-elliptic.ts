import { completeEllipticK } from './complete-elliptic-k';

const MAX_STEPS = 64;
const cs = new Float64Array(MAX_STEPS + 1);
const as = new Float64Array(MAX_STEPS + 1);

/**
 * Jacobi elliptic functions sn, cn, dn of argument u and parameter m = k² (0 ≤ m ≤ 1), written to
 * out = [sn, cn, dn]. Descending AGM (Landen) scheme for the amplitude φ, DLMF 22.20(ii); then
 * sn = sin φ, cn = cos φ and dn = √(cn² + mc·sn²) (= √(1 − m sn²), DLMF 22.6.1, written as a sum of
 * positive terms: A&S 16.4's cos φ0 / cos(φ1 − φ0) is 0/0 at u = K). `mc` = 1 − m may be passed for
 * accuracy near m = 1. The argument is first reduced
 * modulo the real period 4K so large u keeps its accuracy. m = 0 and m = 1 use the closed forms
 * (sin, cos, 1) and (tanh, sech, sech).
 */
export function jacobiSnCnDn(out: Float64Array, u: number, m: number, mc = 1 - m): Float64Array {
  if (m <= 0) {
    out[0] = Math.sin(u);
    out[1] = Math.cos(u);
    out[2] = 1;
    return out;
  }
  if (mc <= 0) {
    const s = 1 / Math.cosh(u);
    out[0] = Math.tanh(u);
    out[1] = s;
    out[2] = s;
    return out;
  }
  const k4 = 4 * completeEllipticK(m, mc);
  if (Math.abs(u) > k4) u -= k4 * Math.round(u / k4);
  let a = 1,
    b = Math.sqrt(mc),
    c = Math.sqrt(m);
  let n = 0;
  as[0] = a;
  cs[0] = c;
  while (Math.abs(c) > Number.EPSILON * a && n < MAX_STEPS) {
    const an = 0.5 * (a + b);
    c = 0.5 * (a - b);
    b = Math.sqrt(a * b);
    a = an;
    n++;
    as[n] = a;
    cs[n] = c;
  }
  let phi = Math.pow(2, n) * a * u;
  for (let j = n; j >= 1; j--) phi = 0.5 * (phi + Math.asin((cs[j] / as[j]) * Math.sin(phi)));
  const sn = Math.sin(phi),
    cn = Math.cos(phi);
  out[0] = sn;
  out[1] = cn;
  out[2] = Math.sqrt(cn * cn + mc * sn * sn);
  return out;
}
