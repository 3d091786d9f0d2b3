import { expectAbsClose } from '../testing/expect-close';
import { boundedLevenbergMarquardt, type BoundedProblem } from './bounded-least-squares';

/** Rosenbrock's function as two residuals: r1 = 10(x2 − x1²), r2 = 1 − x1 (Moré, Garbow & Hillstrom, ACM TOMS 7(1), 1981, problem 1). */
function rosenbrock(lower: number[], upper: number[]): BoundedProblem {
  return {
    lower,
    upper,
    residualCount: 2,
    residuals(x, out) {
      out[0] = 10 * (x[1] - x[0] * x[0]);
      out[1] = 1 - x[0];
      return true;
    },
  };
}

describe('boundedLevenbergMarquardt', () => {
  it("finds the minimum (1, 1) of Rosenbrock's function from the standard start (−1.2, 1) (Moré, Garbow & Hillstrom 1981, problem 1)", () => {
    const run = boundedLevenbergMarquardt(rosenbrock([-5, -5], [5, 5]), [-1.2, 1]);
    expectAbsClose(run.x[0], 1, 1e-8, 'x1');
    expectAbsClose(run.x[1], 1, 1e-8, 'x2');
    expect(run.cost).toBeLessThan(1e-20);
  });

  it('with x1 ≤ 0.5 it stops on the bound exactly at (0.5, 0.25): r1 can still vanish (x2 = x1²) and r2 = 1 − x1 is least at the bound (derived by hand)', () => {
    const run = boundedLevenbergMarquardt(rosenbrock([-2, -2], [0.5, 2]), [-1.2, 1]);
    expect(run.x[0]).toBe(0.5);
    expectAbsClose(run.x[1], 0.25, 1e-8, 'x2');
    expectAbsClose(run.cost, 0.5 * 0.5 * 0.5, 1e-12, 'cost ½·r2²');
  });

  it('never evaluates outside the bounds, and refuses a step into a region where the model is invalid', () => {
    // r1 = x² − 9, r2 = y − 1 from (0.5, 0): the first Gauss–Newton step for x is +8.75, projected onto the bound x = 4,
    // where the model refuses (x > 3.5); the damped steps that follow reach the root x = 3, y = 1.
    const seen: number[][] = [];
    let refused = 0;
    const problem: BoundedProblem = {
      lower: [0, -2],
      upper: [4, 2],
      residualCount: 2,
      residuals(x, out) {
        seen.push([x[0], x[1]]);
        if (x[0] > 3.5) {
          refused++;
          return false;
        }
        out[0] = x[0] * x[0] - 9;
        out[1] = x[1] - 1;
        return true;
      },
    };
    const run = boundedLevenbergMarquardt(problem, [0.5, 0]);
    expect(refused).toBeGreaterThan(0);
    expect(seen.every(([a, b]) => a >= 0 && a <= 4 && b >= -2 && b <= 2)).toBe(true);
    expectAbsClose(run.x[0], 3, 1e-9, 'x');
    expectAbsClose(run.x[1], 1, 1e-9, 'y');
  });
});
