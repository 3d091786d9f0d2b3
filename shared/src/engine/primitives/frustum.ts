import { setAxialSolid, type Solid } from './solid';

// Four-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_X = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
const GL_W = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];

/**
 * Cone frustum along local z: base disc of radius R at z = 0, top disc of radius r at z = h (r = 0
 * is a full cone with its apex at +z); unit density.
 * Integrated from thin disc slices ρ(z) = R + (r − R)z/h: dV = πρ² dz, a slice's own moments
 * ρ²/2 (axial) and ρ²/4 (transverse) per unit mass, plus z² for the transverse parallel-axis term.
 * The integrands are polynomials of degree ≤ 4 in z, so 4-point Gauss–Legendre (exact to degree 7)
 * gives them exactly. Precondition: R > 0, r ≥ 0, h > 0 (m).
 */
export function frustumSolid(out: Solid, baseRadius: number, topRadius: number, h: number): Solid {
  let v = 0,
    mz = 0,
    szz = 0,
    q = 0;
  const half = h / 2;
  for (let i = 0; i < 4; i++) {
    const z = half * (GL_X[i] + 1);
    const rho = baseRadius + ((topRadius - baseRadius) * z) / h;
    const a = Math.PI * rho * rho * GL_W[i] * half; // πρ² dz
    v += a;
    mz += a * z;
    szz += a * z * z;
    q += a * rho * rho;
  }
  const zc = mz / v;
  const transverse = q / 4 + szz - v * zc * zc; // parallel-axis shift from z = 0 to the centroid
  return setAxialSolid(out, v, zc, transverse, transverse, q / 2);
}
