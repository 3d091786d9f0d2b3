import { CholeskyDecomposition, Matrix } from 'ml-matrix';

/** A bounded nonlinear least-squares problem: minimise ½·Σ r_j(x)² with lower ≤ x ≤ upper. */
export interface BoundedProblem {
  /** Inclusive bounds of each parameter (finite, lower < upper). */
  lower: ArrayLike<number>;
  upper: ArrayLike<number>;
  /** Number of residuals. */
  residualCount: number;
  /** out = r(x); returns false where x gives no valid model (the step that reached it is refused). */
  residuals(x: Float64Array, out: Float64Array): boolean;
}

/** Where a run ended. */
export interface LeastSquaresResult {
  x: Float64Array;
  residuals: Float64Array;
  /** ½·Σ r_j² at x. */
  cost: number;
  iterations: number;
  evaluations: number;
}

/** Options of boundedLevenbergMarquardt. */
export interface LeastSquaresOptions {
  /** Most iterations (Jacobian updates), default 100. */
  maxIterations?: number;
  /** Central-difference step as a share of each parameter's range, default 1e-6. */
  relativeStep?: number;
  /** Stop once ½·Σ r² falls to this, default 1e-26. */
  costTolerance?: number;
  /** Stop once every |r_j| is at most this, default 0 (off). */
  residualTolerance?: number;
}

/** Iterations in a row whose relative gain stays under STALL_GAIN before a run counts as stalled. */
const STALL_ITERATIONS = 10;
const STALL_GAIN = 1e-3;

/**
 * Levenberg–Marquardt with bounds by projection (J. J. Moré, "The Levenberg–Marquardt algorithm:
 * implementation and theory", Lecture Notes in Mathematics 630, 1978, for the damped Gauss–Newton
 * step with Marquardt's diagonal scaling; the projection onto the box and the freezing of a
 * parameter at a bound its gradient pushes against as in Kanzow, Yamashita & Fukushima, "Levenberg–
 * Marquardt methods with strong local convergence properties for solving nonlinear equations with
 * convex constraints", J. Comput. Appl. Math. 172 (2004)).
 *
 * Parameters are scaled to u = (x − lower)/(upper − lower) ∈ [0, 1]; the Jacobian is taken by
 * central differences with a step `relativeStep` of each range (one-sided at a bound or where the
 * other side is invalid); each step solves (JᵀJ + λ·diag(JᵀJ)) δ = −Jᵀr (Cholesky, ml-matrix) over
 * the parameters not held at a bound, is projected onto the box, and is taken only when it lowers
 * the cost (else λ grows). It stops at the cost or residual tolerance, at a stationary point (projected
 * gradient negligible), when λ has grown past 1e12, or after ten steps in a row that each lower the
 * cost by less than 0.1 %. Bounds hold exactly: a parameter at a bound equals that bound.
 * Precondition: x0 within the bounds and valid.
 */
export function boundedLevenbergMarquardt(
  problem: BoundedProblem,
  x0: ArrayLike<number>,
  options: LeastSquaresOptions = {},
): LeastSquaresResult {
  const n = x0.length,
    m = problem.residualCount;
  const maxIterations = options.maxIterations ?? 100;
  const h = options.relativeStep ?? 1e-6;
  const costTolerance = options.costTolerance ?? 1e-26;
  const residualTolerance = options.residualTolerance ?? 0;
  const small = (v: Float64Array) => {
    for (let j = 0; j < m; j++) if (!(Math.abs(v[j]) <= residualTolerance)) return false;
    return true;
  };
  const lo = problem.lower,
    hi = problem.upper;
  const toX = (u: ArrayLike<number>, x: Float64Array) => {
    for (let i = 0; i < n; i++)
      x[i] = u[i] <= 0 ? lo[i] : u[i] >= 1 ? hi[i] : Math.min(hi[i], Math.max(lo[i], lo[i] + u[i] * (hi[i] - lo[i])));
    return x;
  };
  const x = new Float64Array(n);
  let evaluations = 0;
  const evaluate = (u: Float64Array, out: Float64Array): number => {
    evaluations++;
    if (!problem.residuals(toX(u, x), out)) return Number.POSITIVE_INFINITY;
    let s = 0;
    for (let j = 0; j < m; j++) s += out[j] * out[j];
    return Number.isFinite(s) ? s / 2 : Number.POSITIVE_INFINITY;
  };

  const u = new Float64Array(n);
  for (let i = 0; i < n; i++) u[i] = Math.min(1, Math.max(0, (x0[i] - lo[i]) / (hi[i] - lo[i])));
  const r = new Float64Array(m),
    rTrial = new Float64Array(m),
    rPlus = new Float64Array(m),
    rMinus = new Float64Array(m);
  const uTrial = new Float64Array(n),
    probe = new Float64Array(n);
  const J = new Float64Array(m * n),
    g = new Float64Array(n),
    A = new Float64Array(n * n);
  let cost = evaluate(u, r);
  if (!Number.isFinite(cost)) throw new Error('boundedLevenbergMarquardt: the starting point is not valid');
  let lambda = 1e-3;
  let iterations = 0,
    slow = 0;
  for (; iterations < maxIterations && cost > costTolerance && !small(r); iterations++) {
    // Jacobian in u by central differences (one-sided at a bound or beside an invalid region).
    for (let i = 0; i < n; i++) {
      probe.set(u);
      const up = Math.min(1, u[i] + h),
        down = Math.max(0, u[i] - h);
      probe[i] = up;
      const okUp = up > u[i] && Number.isFinite(evaluate(probe, rPlus));
      probe[i] = down;
      const okDown = down < u[i] && Number.isFinite(evaluate(probe, rMinus));
      for (let j = 0; j < m; j++) {
        J[j * n + i] =
          okUp && okDown
            ? (rPlus[j] - rMinus[j]) / (up - down)
            : okUp
              ? (rPlus[j] - r[j]) / (up - u[i])
              : okDown
                ? (r[j] - rMinus[j]) / (u[i] - down)
                : 0;
      }
    }
    let maxDiag = 0;
    for (let a = 0; a < n; a++) {
      let s = 0;
      for (let j = 0; j < m; j++) s += J[j * n + a] * r[j];
      g[a] = s;
      for (let b = 0; b < n; b++) {
        let t = 0;
        for (let j = 0; j < m; j++) t += J[j * n + a] * J[j * n + b];
        A[a * n + b] = t;
      }
      maxDiag = Math.max(maxDiag, A[a * n + a]);
    }
    // Parameters held at a bound that the descent direction −g pushes against.
    // Stationary when every other component of the gradient is negligible against |J_i|·|r|.
    const free: number[] = [];
    let moving = false;
    for (let i = 0; i < n; i++) {
      if ((u[i] <= 0 && g[i] > 0) || (u[i] >= 1 && g[i] < 0)) continue;
      free.push(i);
      if (Math.abs(g[i]) > 1e-12 * Math.sqrt(A[i * n + i] * 2 * cost)) moving = true;
    }
    if (!moving || maxDiag === 0) break;
    let accepted = false,
      stalled = false;
    while (!accepted) {
      if (lambda > 1e12) {
        stalled = true;
        break;
      }
      const k = free.length;
      const M = new Matrix(k, k);
      const b = new Matrix(k, 1);
      for (let a = 0; a < k; a++) {
        const ia = free[a];
        for (let c = 0; c < k; c++) M.set(a, c, A[ia * n + free[c]]);
        M.set(a, a, A[ia * n + ia] + lambda * Math.max(A[ia * n + ia], 1e-9 * maxDiag));
        b.set(a, 0, -g[ia]);
      }
      const chol = new CholeskyDecomposition(M);
      if (!chol.isPositiveDefinite()) {
        lambda *= 4;
        continue;
      }
      const delta = chol.solve(b);
      uTrial.set(u);
      let moved = 0;
      for (let a = 0; a < k; a++) {
        const i = free[a];
        uTrial[i] = Math.min(1, Math.max(0, u[i] + delta.get(a, 0)));
        moved = Math.max(moved, Math.abs(uTrial[i] - u[i]));
      }
      if (moved < 1e-15) {
        stalled = true;
        break;
      }
      const trialCost = evaluate(uTrial, rTrial);
      if (trialCost < cost) {
        const gain = cost - trialCost;
        u.set(uTrial);
        r.set(rTrial);
        cost = trialCost;
        lambda = Math.max(lambda / 3, 1e-12);
        accepted = true;
        if (gain <= 1e-14 * cost && moved < 1e-12) stalled = true;
        // Crawling along a nearly flat valley (parameters the targets barely tell apart): stop after a run of tiny gains.
        slow = gain <= STALL_GAIN * (cost + gain) ? slow + 1 : 0;
        if (slow >= STALL_ITERATIONS) stalled = true;
      } else {
        lambda *= 4;
      }
    }
    if (stalled) {
      iterations++;
      break;
    }
  }
  return { x: Float64Array.from(toX(u, x)), residuals: r, cost, iterations, evaluations };
}
