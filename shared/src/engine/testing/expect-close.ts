import { relativelyEqual } from '../linear/tolerance';

/** Asserts |actual − expected| ≤ ε·max(|actual|, |expected|), with a readable failure message. */
export function expectRelClose(actual: number, expected: number, epsilon: number, what = 'value'): void {
  if (!relativelyEqual(actual, expected, epsilon) && !(actual === 0 && expected === 0)) {
    throw new Error(
      `${what}: expected ${expected}, got ${actual} (relative error ${Math.abs(actual - expected) / Math.max(Math.abs(actual), Math.abs(expected))}, allowed ${epsilon})`,
    );
  }
}

/** Asserts |actual − expected| ≤ tolerance. */
export function expectAbsClose(actual: number, expected: number, tolerance: number, what = 'value'): void {
  if (!(Math.abs(actual - expected) <= tolerance)) {
    throw new Error(`${what}: expected ${expected}, got ${actual} (difference ${Math.abs(actual - expected)}, allowed ${tolerance})`);
  }
}

/** Element-wise relative closeness against a scale (for tensors whose off-diagonals may be ~0). */
export function expectArrayClose(
  actual: ArrayLike<number>,
  expected: ArrayLike<number>,
  tolerance: number,
  scale: number,
  what = 'array',
): void {
  if (actual.length !== expected.length) throw new Error(`${what}: length ${actual.length} ≠ ${expected.length}`);
  for (let i = 0; i < actual.length; i++) expectAbsClose(actual[i], expected[i], tolerance * scale, `${what}[${i}]`);
}
