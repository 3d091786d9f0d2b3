/**
 * Relative-or-absolute closeness: |a − b| ≤ ε·max(1, |a|, |b|).
 * The one tolerance rule used across the engine and its tests (the gl-matrix convention).
 */
export function nearlyEqual(a: number, b: number, epsilon = 1e-12): boolean {
  return Math.abs(a - b) <= epsilon * Math.max(1, Math.abs(a), Math.abs(b));
}

/**
 * Pure relative closeness |a − b| ≤ ε·max(|a|, |b|), for quantities whose scale is far from 1
 * (inertia in kg·m² is often 1e-5, where the absolute floor of `nearlyEqual` would hide errors).
 */
export function relativelyEqual(a: number, b: number, epsilon: number): boolean {
  return Math.abs(a - b) <= epsilon * Math.max(Math.abs(a), Math.abs(b));
}
