/**
 * Eigen-decomposition of a symmetric 3×3 matrix by the cyclic Jacobi method
 * (Golub & Van Loan, Matrix Computations, 4th ed., §8.5.2–8.5.3, Algorithms 8.5.1 "sym.schur2" and
 * 8.5.3 "cyclic Jacobi"). Keeps full relative accuracy even when two eigenvalues nearly coincide
 * (Kopp, IJMPC 19 (2008)), unlike the closed-form trigonometric solution.
 *
 * Input: row-major symmetric `a` (only the upper triangle is read). Output: `values` (3, unsorted)
 * and `vectors` (row-major 3×3 whose COLUMNS are the unit eigenvectors). Returns the sweep count.
 * Scratch is module-level, so the hot path does not allocate; not re-entrant across threads (none in JS).
 */
export function jacobiEigen(a: ArrayLike<number>, values: Float64Array, vectors: Float64Array): number {
  let a00 = a[0],
    a11 = a[4],
    a22 = a[8],
    a01 = a[1],
    a02 = a[2],
    a12 = a[5];
  let v00 = 1,
    v01 = 0,
    v02 = 0,
    v10 = 0,
    v11 = 1,
    v12 = 0,
    v20 = 0,
    v21 = 0,
    v22 = 1;
  const scale = Math.abs(a00) + Math.abs(a11) + Math.abs(a22) + Math.abs(a01) + Math.abs(a02) + Math.abs(a12);
  let sweep = 0;
  if (scale > 0) {
    for (; sweep < 32; sweep++) {
      const off = Math.abs(a01) + Math.abs(a02) + Math.abs(a12);
      if (off <= scale * 1e-300 || off === 0) break;
      // Rotations below rounding of the diagonal are dropped (the classic threshold test).
      // (p, q) = (0, 1)
      if (a01 !== 0) {
        if (Math.abs(a01) <= 1e-18 * (Math.abs(a00) + Math.abs(a11))) a01 = 0;
        else {
          const theta = (a11 - a00) / (2 * a01);
          const t = (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
          const c = 1 / Math.sqrt(t * t + 1),
            s = t * c;
          a00 -= t * a01;
          a11 += t * a01;
          a01 = 0;
          const x = a02,
            y = a12;
          a02 = c * x - s * y;
          a12 = s * x + c * y;
          let p, q;
          p = v00;
          q = v01;
          v00 = c * p - s * q;
          v01 = s * p + c * q;
          p = v10;
          q = v11;
          v10 = c * p - s * q;
          v11 = s * p + c * q;
          p = v20;
          q = v21;
          v20 = c * p - s * q;
          v21 = s * p + c * q;
        }
      }
      // (p, q) = (0, 2)
      if (a02 !== 0) {
        if (Math.abs(a02) <= 1e-18 * (Math.abs(a00) + Math.abs(a22))) a02 = 0;
        else {
          const theta = (a22 - a00) / (2 * a02);
          const t = (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
          const c = 1 / Math.sqrt(t * t + 1),
            s = t * c;
          a00 -= t * a02;
          a22 += t * a02;
          a02 = 0;
          const x = a01,
            y = a12;
          a01 = c * x - s * y;
          a12 = s * x + c * y;
          let p, q;
          p = v00;
          q = v02;
          v00 = c * p - s * q;
          v02 = s * p + c * q;
          p = v10;
          q = v12;
          v10 = c * p - s * q;
          v12 = s * p + c * q;
          p = v20;
          q = v22;
          v20 = c * p - s * q;
          v22 = s * p + c * q;
        }
      }
      // (p, q) = (1, 2)
      if (a12 !== 0) {
        if (Math.abs(a12) <= 1e-18 * (Math.abs(a11) + Math.abs(a22))) a12 = 0;
        else {
          const theta = (a22 - a11) / (2 * a12);
          const t = (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
          const c = 1 / Math.sqrt(t * t + 1),
            s = t * c;
          a11 -= t * a12;
          a22 += t * a12;
          a12 = 0;
          const x = a01,
            y = a02;
          a01 = c * x - s * y;
          a02 = s * x + c * y;
          let p, q;
          p = v01;
          q = v02;
          v01 = c * p - s * q;
          v02 = s * p + c * q;
          p = v11;
          q = v12;
          v11 = c * p - s * q;
          v12 = s * p + c * q;
          p = v21;
          q = v22;
          v21 = c * p - s * q;
          v22 = s * p + c * q;
        }
      }
    }
  }
  values[0] = a00;
  values[1] = a11;
  values[2] = a22;
  vectors[0] = v00;
  vectors[1] = v01;
  vectors[2] = v02;
  vectors[3] = v10;
  vectors[4] = v11;
  vectors[5] = v12;
  vectors[6] = v20;
  vectors[7] = v21;
  vectors[8] = v22;
  return sweep;
}
