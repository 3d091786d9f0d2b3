import { completeEllipticK } from './complete-elliptic-k';

/**
 * Carlson's symmetric integral R_F(x, y, z) by the duplication theorem (B. C. Carlson, "Numerical
 * computation of real or complex elliptic integrals", Numer. Algorithms 10 (1995); DLMF 19.36.1).
 * Stops when the relative spread is below 1.5e-3 (truncation error ~ε⁶ < 1e-16) or after 40 steps.
 * Precondition: x, y, z ≥ 0, at most one of them zero.
 */
export function carlsonRF(x: number, y: number, z: number): number {
  let a = (x + y + z) / 3;
  for (let i = 0; i < 40; i++) {
    const dx = 1 - x / a,
      dy = 1 - y / a,
      dz = 1 - z / a;
    if (Math.max(Math.abs(dx), Math.abs(dy), Math.abs(dz)) < 1.5e-3) break;
    const sx = Math.sqrt(x),
      sy = Math.sqrt(y),
      sz = Math.sqrt(z);
    const lambda = sx * sy + sy * sz + sz * sx;
    x = 0.25 * (x + lambda);
    y = 0.25 * (y + lambda);
    z = 0.25 * (z + lambda);
    a = 0.25 * (a + lambda);
  }
  const X = 1 - x / a,
    Y = 1 - y / a,
    Z = -(X + Y);
  const e2 = X * Y - Z * Z,
    e3 = X * Y * Z;
  return (1 - e2 / 10 + e3 / 14 + (e2 * e2) / 24 - (3 * e2 * e3) / 44) / Math.sqrt(a);
}

/**
 * Incomplete elliptic integral of the first kind F(φ | m) for real φ in [−π, π]:
 * F = sin φ · R_F(cos²φ, 1 − m sin²φ, 1) for |φ| ≤ π/2 (DLMF 19.25.5), extended by
 * F(π − φ) = 2K − F(φ) and oddness. 1 − m sin²φ is formed as cos²φ + mc sin²φ, exact near m = 1.
 * The inverse of the amplitude: sn(F(φ | m) | m) = sin φ.
 */
export function incompleteEllipticF(phi: number, m: number, mc = 1 - m): number {
  if (phi > Math.PI / 2) return 2 * completeEllipticK(m, mc) - incompleteEllipticF(Math.PI - phi, m, mc);
  if (phi < -Math.PI / 2) return -incompleteEllipticF(-phi, m, mc);
  const s = Math.sin(phi),
    c = Math.cos(phi);
  if (s === 0) return 0;
  return s * carlsonRF(c * c, c * c + mc * s * s, 1);
}
