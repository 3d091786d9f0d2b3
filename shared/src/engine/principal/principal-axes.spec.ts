import fc from 'fast-check';
import { eigs } from 'mathjs';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { determinant, multiply, transpose } from '../linear/mat3';
import { rotationFromDegrees } from '../linear/rotation-from-degrees';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { jacobiEigen } from './jacobi';
import { createPrincipalAxes, principalAxes } from './principal-axes';

/** R·diag(d)·Rᵀ for Euler angles (degrees). */
function tensor(d: [number, number, number], angles: [number, number, number]): Float64Array {
  const r = rotationFromDegrees(new Float64Array(9), ...angles);
  const D = new Float64Array([d[0], 0, 0, 0, d[1], 0, 0, 0, d[2]]);
  const t = multiply(new Float64Array(9), r, D);
  return multiply(t, t, transpose(new Float64Array(9), r));
}

const moments = fc.tuple(
  fc.double({ min: 1e-6, max: 1, noNaN: true }),
  fc.double({ min: 1e-6, max: 1, noNaN: true }),
  fc.double({ min: 1e-6, max: 1, noNaN: true }),
);
const angles = fc.tuple(
  fc.double({ min: -180, max: 180, noNaN: true }),
  fc.double({ min: -90, max: 90, noNaN: true }),
  fc.double({ min: -180, max: 180, noNaN: true }),
);

describe('cyclic Jacobi (Golub & Van Loan §8.5)', () => {
  it('satisfies A·V = V·D and VᵀV = I on random symmetric matrices (the invariants ml-matrix tests)', () => {
    fc.assert(
      fc.property(moments, angles, (d, ang) => {
        const A = tensor(d, ang);
        const vals = new Float64Array(3),
          V = new Float64Array(9);
        jacobiEigen(A, vals, V);
        const scale = Math.max(...d);
        for (let c = 0; c < 3; c++) {
          for (let r = 0; r < 3; r++) {
            const av = A[3 * r] * V[c] + A[3 * r + 1] * V[3 + c] + A[3 * r + 2] * V[6 + c];
            expectAbsClose(av, vals[c] * V[3 * r + c], 1e-14 * scale);
          }
        }
        const VtV = multiply(new Float64Array(9), transpose(new Float64Array(9), V), V);
        for (let i = 0; i < 9; i++) expectAbsClose(VtV[i], i % 4 === 0 ? 1 : 0, 1e-14);
      }),
      { numRuns: 200 },
    );
  });

  it('agrees with ml-matrix EigenvalueDecomposition (general-purpose reference, npm ml-matrix 6)', () => {
    fc.assert(
      fc.property(moments, angles, (d, ang) => {
        const A = tensor(d, ang);
        const p = principalAxes(undefined, A);
        const ref = new EigenvalueDecomposition(
          new Matrix([
            [A[0], A[1], A[2]],
            [A[3], A[4], A[5]],
            [A[6], A[7], A[8]],
          ]),
          { assumeSymmetric: true },
        );
        const rv = [...ref.realEigenvalues].sort((a, b) => b - a);
        for (let i = 0; i < 3; i++) expectAbsClose(p.moments[i], rv[i], 1e-14 * Math.max(...d));
      }),
      { numRuns: 200 },
    );
  });

  it('agrees with mathjs eigs, eigenvalues and eigenvectors (precision scaled to the trace)', () => {
    fc.assert(
      fc.property(moments, angles, (d, ang) => {
        // Keep the moments apart so eigenvectors are well defined for the comparison.
        const dd: [number, number, number] = [d[0] + 2, d[1] + 1, d[2]];
        const A = tensor(dd, ang);
        const rows = [
          [A[0], A[1], A[2]],
          [A[3], A[4], A[5]],
          [A[6], A[7], A[8]],
        ];
        const trace = A[0] + A[4] + A[8];
        const ref = eigs(rows, { precision: Number((1e-15 * trace).toPrecision(15)) }) as unknown as {
          eigenvectors: { value: number; vector: number[] }[];
        };
        const p = principalAxes(undefined, A);
        const sorted = [...ref.eigenvectors].sort((a, b) => b.value - a.value);
        for (let i = 0; i < 3; i++) {
          expectAbsClose(p.moments[i], sorted[i].value, 1e-14 * trace); // both are accurate to ε·‖A‖, not relative to a tiny moment
          const v = sorted[i].vector,
            n = Math.hypot(v[0], v[1], v[2]);
          const dot = (p.axes[3 * i] * v[0] + p.axes[3 * i + 1] * v[1] + p.axes[3 * i + 2] * v[2]) / n;
          expectAbsClose(Math.abs(dot), 1, 1e-10);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('keeps two nearly equal moments apart to full relative accuracy (Kopp 2008: closed forms lose √ε here)', () => {
    const d: [number, number, number] = [2, 1 + 1e-10, 1];
    const p = principalAxes(undefined, tensor(d, [31, 47, -12]), 1e-14);
    expectAbsClose(p.moments[1] - p.moments[2], 1e-10, 2e-15);
    expectRelClose(p.moments[0], 2, 1e-15);
  });
});

describe('principalAxes', () => {
  it('sorts I1 ≥ I2 ≥ I3 and returns right-handed unit rows', () => {
    fc.assert(
      fc.property(moments, angles, (d, ang) => {
        const p = principalAxes(undefined, tensor(d, ang));
        expect(p.moments[0]).toBeGreaterThanOrEqual(p.moments[1]);
        expect(p.moments[1]).toBeGreaterThanOrEqual(p.moments[2]);
        expectAbsClose(determinant(p.axes), 1, 1e-13);
      }),
      { numRuns: 200 },
    );
  });

  it('inside an equal pair puts the preferred (grip) axis first, projected on the pair plane, deterministically', () => {
    // A rod: unique minor axis along z, equal transverse moments.
    const A = new Float64Array([5, 0, 0, 0, 5, 0, 0, 0, 1]);
    const p = principalAxes(undefined, A, 1e-9, [
      [0, 0, 1],
      [Math.SQRT1_2, Math.SQRT1_2, 0],
    ]);
    expect(p.equalPairs).toEqual([true, false]);
    expectAbsClose(p.axes[0], Math.SQRT1_2, 1e-15);
    expectAbsClose(p.axes[1], Math.SQRT1_2, 1e-15);
    expectAbsClose(Math.abs(p.axes[8]), 1, 1e-15);
    expectAbsClose(determinant(p.axes), 1, 1e-15);
    const again = principalAxes(undefined, A, 1e-9, [
      [0, 0, 1],
      [Math.SQRT1_2, Math.SQRT1_2, 0],
    ]);
    expect(Array.from(again.axes)).toEqual(Array.from(p.axes));
  });

  it('three equal moments: the basis comes from the preferences by Gram–Schmidt', () => {
    const p = principalAxes(undefined, new Float64Array([2, 0, 0, 0, 2, 0, 0, 0, 2]), 1e-9, [
      [0, 0, 1],
      [1, 0, 0],
    ]);
    expect(p.equalPairs).toEqual([true, true]);
    expect(Array.from(p.axes)).toEqual([0, 0, 1, 1, 0, 0, 0, 1, 0]);
  });

  it('writes into the given out (and out may be reused) and allocates a new one by default', () => {
    const out = createPrincipalAxes();
    const A = tensor([3, 2, 1], [10, 20, 30]);
    expect(principalAxes(out, A)).toBe(out);
    const fresh = principalAxes(undefined, A);
    expect(fresh).not.toBe(out);
    expect(Array.from(fresh.moments)).toEqual(Array.from(out.moments));
  });
});
