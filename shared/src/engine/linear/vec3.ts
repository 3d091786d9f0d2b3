/**
 * 3-vectors as plain number arrays of length 3 (V8 keeps them unboxed and allocates them far faster
 * than typed arrays, which matters for per-primitive scratch). Plain functions with the output argument first, `(out, a, b) => out`;
 * `out` may alias an input. Units and frame are the caller's.
 */
export type Vec3 = number[];

/** A new vector (x, y, z). */
export function vec3(x = 0, y = 0, z = 0): Vec3 {
  return [x, y, z];
}

/** A new vector copied from any array-like of three numbers. */
export function vec3From(a: ArrayLike<number>): Vec3 {
  return vec3(a[0], a[1], a[2]);
}

/** Dot product a·b. */
export function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** Euclidean length |a|. */
export function length(a: ArrayLike<number>): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** out = a × b (right-handed). */
export function cross(out: Vec3, a: ArrayLike<number>, b: ArrayLike<number>): Vec3 {
  const x = a[1] * b[2] - a[2] * b[1];
  const y = a[2] * b[0] - a[0] * b[2];
  const z = a[0] * b[1] - a[1] * b[0];
  out[0] = x;
  out[1] = y;
  out[2] = z;
  return out;
}

/** out = a + s·b. */
export function addScaled(out: Vec3, a: ArrayLike<number>, b: ArrayLike<number>, s: number): Vec3 {
  out[0] = a[0] + s * b[0];
  out[1] = a[1] + s * b[1];
  out[2] = a[2] + s * b[2];
  return out;
}

/** out = s·a. */
export function scale(out: Vec3, a: ArrayLike<number>, s: number): Vec3 {
  out[0] = a[0] * s;
  out[1] = a[1] * s;
  out[2] = a[2] * s;
  return out;
}

/** out = a / |a|. Precondition: |a| > 0 (a zero vector gives zeros, never NaN). */
export function normalize(out: Vec3, a: ArrayLike<number>): Vec3 {
  const l = length(a);
  const s = l > 0 ? 1 / l : 0;
  return scale(out, a, s);
}

/** A plain number array [x, y, z] for JSON output. */
export function toArray3(a: ArrayLike<number>): [number, number, number] {
  return [a[0], a[1], a[2]];
}
