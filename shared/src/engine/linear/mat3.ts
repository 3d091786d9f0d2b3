/**
 * 3×3 matrices as plain number arrays of length 9, row-major: m[3*i + j] is row i, column j.
 * Output argument first; `out` may alias an input unless a function says otherwise.
 */
export type Mat3 = number[];

/** A new zero matrix. */
export function mat3(): Mat3 {
  return [0, 0, 0, 0, 0, 0, 0, 0, 0];
}

/** A new matrix from nine numbers, row by row. */
export function mat3From(a: ArrayLike<number>): Mat3 {
  return [a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8]];
}

/** out = identity. */
export function identity<T extends Mat3 | Float64Array>(out: T): T {
  out.fill(0);
  out[0] = out[4] = out[8] = 1;
  return out;
}

/** out = a·b. */
export function multiply<T extends Mat3 | Float64Array>(out: T, a: ArrayLike<number>, b: ArrayLike<number>): T {
  const a00 = a[0],
    a01 = a[1],
    a02 = a[2],
    a10 = a[3],
    a11 = a[4],
    a12 = a[5],
    a20 = a[6],
    a21 = a[7],
    a22 = a[8];
  const b00 = b[0],
    b01 = b[1],
    b02 = b[2],
    b10 = b[3],
    b11 = b[4],
    b12 = b[5],
    b20 = b[6],
    b21 = b[7],
    b22 = b[8];
  out[0] = a00 * b00 + a01 * b10 + a02 * b20;
  out[1] = a00 * b01 + a01 * b11 + a02 * b21;
  out[2] = a00 * b02 + a01 * b12 + a02 * b22;
  out[3] = a10 * b00 + a11 * b10 + a12 * b20;
  out[4] = a10 * b01 + a11 * b11 + a12 * b21;
  out[5] = a10 * b02 + a11 * b12 + a12 * b22;
  out[6] = a20 * b00 + a21 * b10 + a22 * b20;
  out[7] = a20 * b01 + a21 * b11 + a22 * b21;
  out[8] = a20 * b02 + a21 * b12 + a22 * b22;
  return out;
}

/** out = aᵀ. */
export function transpose<T extends Mat3 | Float64Array>(out: T, a: ArrayLike<number>): T {
  const a01 = a[1],
    a02 = a[2],
    a12 = a[5];
  out[0] = a[0];
  out[4] = a[4];
  out[8] = a[8];
  out[1] = a[3];
  out[2] = a[6];
  out[5] = a[7];
  out[3] = a01;
  out[6] = a02;
  out[7] = a12;
  return out;
}

/** out = R·S·Rᵀ: a tensor S given in a rotated frame expressed in the outer frame (R maps inner to outer). */
export function rotateTensor<T extends Mat3 | Float64Array>(out: T, r: ArrayLike<number>, s: ArrayLike<number>): T {
  const t = scratch;
  multiply(t, r, s);
  const r00 = r[0],
    r01 = r[1],
    r02 = r[2],
    r10 = r[3],
    r11 = r[4],
    r12 = r[5],
    r20 = r[6],
    r21 = r[7],
    r22 = r[8];
  const t00 = t[0],
    t01 = t[1],
    t02 = t[2],
    t10 = t[3],
    t11 = t[4],
    t12 = t[5],
    t20 = t[6],
    t21 = t[7],
    t22 = t[8];
  out[0] = t00 * r00 + t01 * r01 + t02 * r02;
  out[1] = t00 * r10 + t01 * r11 + t02 * r12;
  out[2] = t00 * r20 + t01 * r21 + t02 * r22;
  out[3] = t10 * r00 + t11 * r01 + t12 * r02;
  out[4] = t10 * r10 + t11 * r11 + t12 * r12;
  out[5] = t10 * r20 + t11 * r21 + t12 * r22;
  out[6] = t20 * r00 + t21 * r01 + t22 * r02;
  out[7] = t20 * r10 + t21 * r11 + t22 * r12;
  out[8] = t20 * r20 + t21 * r21 + t22 * r22;
  return out;
}
const scratch: Mat3 = mat3();

/** out = M·v. */
export function transformVec3<T extends number[] | Float64Array>(out: T, m: ArrayLike<number>, v: ArrayLike<number>): T {
  const x = v[0],
    y = v[1],
    z = v[2];
  out[0] = m[0] * x + m[1] * y + m[2] * z;
  out[1] = m[3] * x + m[4] * y + m[5] * z;
  out[2] = m[6] * x + m[7] * y + m[8] * z;
  return out;
}

/** vᵀ·M·v — for an inertia tensor and a unit vector, the moment about that axis. */
export function quadraticForm(m: ArrayLike<number>, v: ArrayLike<number>): number {
  const x = v[0],
    y = v[1],
    z = v[2];
  return x * (m[0] * x + m[1] * y + m[2] * z) + y * (m[3] * x + m[4] * y + m[5] * z) + z * (m[6] * x + m[7] * y + m[8] * z);
}

/** Determinant. */
export function determinant(m: ArrayLike<number>): number {
  return m[0] * (m[4] * m[8] - m[5] * m[7]) - m[1] * (m[3] * m[8] - m[5] * m[6]) + m[2] * (m[3] * m[7] - m[4] * m[6]);
}

/** Rows as nested plain arrays for JSON output. */
export function toRows(m: ArrayLike<number>): [[number, number, number], [number, number, number], [number, number, number]] {
  return [
    [m[0], m[1], m[2]],
    [m[3], m[4], m[5]],
    [m[6], m[7], m[8]],
  ];
}
