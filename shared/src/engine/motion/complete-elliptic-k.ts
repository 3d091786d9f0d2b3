/** Cap on arithmetic–geometric mean iterations: convergence is quadratic, 64 is far beyond need. */
const MAX_AGM_STEPS = 64;

/**
 * Arithmetic–geometric mean AGM(a, b) of two non-negative numbers (DLMF 19.8.1).
 * The loop stops on |a − b| ≤ 4ε·a or after a fixed cap, so it cannot cycle forever on rounding.
 */
export function agm(a: number, b: number): number {
  for (let i = 0; i < MAX_AGM_STEPS && Math.abs(a - b) > 4 * Number.EPSILON * a; i++) {
    const an = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = an;
  }
  return 0.5 * (a + b);
}

/**
 * Complete elliptic integral of the first kind K(m), parameter m = k², by the AGM:
 * K(m) = π / (2·AGM(1, √(1 − m))) (DLMF 19.8.5). Pass the complementary parameter mc = 1 − m when it
 * is known more accurately than 1 − m (near m = 1, the flip-time case). Precondition: 0 ≤ m < 1;
 * m = 1 gives Infinity (the caller reports the separatrix instead).
 */
export function completeEllipticK(m: number, mc = 1 - m): number {
  if (!(mc > 0)) return Infinity;
  return Math.PI / (2 * agm(1, Math.sqrt(mc)));
}
