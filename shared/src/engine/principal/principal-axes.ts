import { jacobiEigen } from './jacobi';

/** Relative gap below which two principal moments count as equal (MECHANICS §3): analytic parts. */
export const EQUAL_MOMENTS_ANALYTIC = 1e-9;
/** Relative gap below which two principal moments count as equal (MECHANICS §3): parts with a mesh. */
export const EQUAL_MOMENTS_MESH = 1e-6;

/** Principal moments and axes of an inertia tensor. */
export interface PrincipalAxes {
  /** I1 ≥ I2 ≥ I3 (kg·m²). */
  moments: Float64Array;
  /** Row-major 3×3 whose ROWS are the unit principal axes in part coordinates, right-handed (row0 × row1 = row2). */
  axes: Float64Array;
  /** equalPairs[0]: I1 and I2 are equal within the tolerance; equalPairs[1]: I2 and I3. */
  equalPairs: [boolean, boolean];
}

/** A new zeroed result. */
export function createPrincipalAxes(): PrincipalAxes {
  return { moments: new Float64Array(3), axes: new Float64Array(9), equalPairs: [false, false] };
}

const vals = new Float64Array(3);
const vecs = new Float64Array(9);
const order = [0, 1, 2];
const DEFAULT_PREFERENCES: readonly (readonly number[])[] = [];
const FALLBACK = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/**
 * out = the principal moments (descending) and right-handed unit axes of the symmetric inertia
 * tensor `inertia` (kg·m², part frame). Eigen-solve by cyclic Jacobi (Golub & Van Loan §8.5).
 *
 * Determinism: each distinct axis is signed so that its largest-magnitude component is positive
 * (the first such component on a tie), and the third axis is the cross product of the first two.
 * Inside a pair of equal moments (relative gap < `equalTolerance`, MECHANICS §3) the eigenvectors
 * are not unique: the first axis of the pair is the first of `preferences` (e.g. the grip axis, then
 * the face normal) with a usable projection on the pair's plane, then Gram–Schmidt; for three equal
 * moments the preferences (then x, y, z) span the basis directly.
 */
export function principalAxes(
  out: PrincipalAxes = createPrincipalAxes(),
  inertia: ArrayLike<number>,
  equalTolerance = EQUAL_MOMENTS_ANALYTIC,
  preferences: readonly (readonly number[])[] = DEFAULT_PREFERENCES,
): PrincipalAxes {
  jacobiEigen(inertia, vals, vecs);
  // Sort three indices by descending eigenvalue (a fixed network, no allocation).
  let i0 = 0,
    i1 = 1,
    i2 = 2,
    t;
  if (vals[i1] > vals[i0]) {
    t = i0;
    i0 = i1;
    i1 = t;
  }
  if (vals[i2] > vals[i1]) {
    t = i1;
    i1 = i2;
    i2 = t;
  }
  if (vals[i1] > vals[i0]) {
    t = i0;
    i0 = i1;
    i1 = t;
  }
  order[0] = i0;
  order[1] = i1;
  order[2] = i2;
  const m = out.moments,
    ax = out.axes;
  for (let r = 0; r < 3; r++) {
    const k = order[r];
    m[r] = vals[k];
    ax[3 * r] = vecs[k];
    ax[3 * r + 1] = vecs[3 + k];
    ax[3 * r + 2] = vecs[6 + k];
  }
  const scale = Math.max(Math.abs(m[0]), Math.abs(m[2]));
  const eq01 = scale > 0 && m[0] - m[1] < equalTolerance * scale;
  const eq12 = scale > 0 && m[1] - m[2] < equalTolerance * scale;
  out.equalPairs[0] = eq01;
  out.equalPairs[1] = eq12;
  if (eq01 && eq12) {
    fillFromPreferences(ax, 0, null, preferences);
  } else if (eq01) {
    fillFromPreferences(ax, 0, 2, preferences);
  } else if (eq12) {
    signCanonically(ax, 0);
    fillFromPreferences(ax, 1, 0, preferences);
  } else {
    signCanonically(ax, 0);
    signCanonically(ax, 1);
    crossRows(ax, 0, 1, 2);
  }
  return out;
}

/** Flip row r so its largest-magnitude component is positive. */
function signCanonically(ax: Float64Array, r: number): void {
  let best = 0;
  for (let c = 1; c < 3; c++) if (Math.abs(ax[3 * r + c]) > Math.abs(ax[3 * r + best]) + 1e-12) best = c;
  if (ax[3 * r + best] < 0) for (let c = 0; c < 3; c++) ax[3 * r + c] = -ax[3 * r + c];
}

/** row c = row a × row b. */
function crossRows(ax: Float64Array, a: number, b: number, c: number): void {
  const ax0 = ax[3 * a],
    ax1 = ax[3 * a + 1],
    ax2 = ax[3 * a + 2];
  const bx0 = ax[3 * b],
    bx1 = ax[3 * b + 1],
    bx2 = ax[3 * b + 2];
  ax[3 * c] = ax1 * bx2 - ax2 * bx1;
  ax[3 * c + 1] = ax2 * bx0 - ax0 * bx2;
  ax[3 * c + 2] = ax0 * bx1 - ax1 * bx0;
}

/**
 * Rows `first` and `first + 1` become a right-handed basis of the plane normal to row `unique`
 * (or, with unique = null, rows 0–2 become a basis from the preferences), the first of them along
 * the first preference with a projection longer than 1e-6.
 */
function fillFromPreferences(ax: Float64Array, first: number, unique: number | null, preferences: readonly (readonly number[])[]): void {
  if (unique !== null) signCanonically(ax, unique);
  const candidates = [...preferences, ...FALLBACK];
  const u = unique === null ? null : [ax[3 * unique], ax[3 * unique + 1], ax[3 * unique + 2]];
  let picked: number[] | null = null;
  for (const p of candidates) {
    const l = Math.hypot(p[0], p[1], p[2]);
    if (!(l > 0)) continue;
    let x = p[0] / l,
      y = p[1] / l,
      z = p[2] / l;
    if (u) {
      const d = x * u[0] + y * u[1] + z * u[2];
      x -= d * u[0];
      y -= d * u[1];
      z -= d * u[2];
    }
    const n = Math.hypot(x, y, z);
    if (n > 1e-6) {
      picked = [x / n, y / n, z / n];
      break;
    }
  }
  const a = picked ?? [1, 0, 0];
  ax[3 * first] = a[0];
  ax[3 * first + 1] = a[1];
  ax[3 * first + 2] = a[2];
  if (unique === null) {
    // Second axis: next preference orthogonalised against the first (Gram–Schmidt).
    let second: number[] | null = null;
    for (const p of candidates) {
      const l = Math.hypot(p[0], p[1], p[2]);
      if (!(l > 0)) continue;
      let x = p[0] / l,
        y = p[1] / l,
        z = p[2] / l;
      const d = x * a[0] + y * a[1] + z * a[2];
      x -= d * a[0];
      y -= d * a[1];
      z -= d * a[2];
      const n = Math.hypot(x, y, z);
      if (n > 1e-6) {
        second = [x / n, y / n, z / n];
        break;
      }
    }
    const b = second!;
    ax[3] = b[0];
    ax[4] = b[1];
    ax[5] = b[2];
    crossRows(ax, 0, 1, 2);
    return;
  }
  // Right-handed: with the pair in rows (0, 1) and unique row 2, row1 = row2 × row0;
  // with unique row 0 and the pair in rows (1, 2), row2 = row0 × row1.
  if (first === 0) crossRows(ax, 2, 0, 1);
  else crossRows(ax, 0, 1, 2);
}
