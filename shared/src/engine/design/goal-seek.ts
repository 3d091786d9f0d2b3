import {
  DESIGN_FIGURE_UNITS,
  goalSeekSettingsSchema,
  type AchievedTarget,
  type DesignChange,
  type DesignFigure,
  type DesignFree,
  type DesignTarget,
  type GoalSeekStatus,
} from '../../schemas/design-targets';
import type { PartDocument } from '../../schemas/part-document';
import { EngineInputError, formatPath, type InputIssue } from '../part/engine-input-error';
import { partMassProperties } from '../part/part-mass-properties';
import { analyzeValidatedPart } from '../report/analyze-part';
import type { SpinReport } from '../report/spin-report';
import { SeededRandom } from '../scatter/seeded-random';
import { boundedLevenbergMarquardt, type BoundedProblem, type LeastSquaresResult } from './bounded-least-squares';
import { checkFigureNames, figureContext, figuresFromBody, type DesignOptions } from './design-figures';
import { DesignModel, type BoundParameter } from './design-model';
import { domainProblem, relationProblem, withNamedParameter, withParameter } from './design-parameters';

/** What goalSeek is asked: the free parameters with their bounds and the targets (SI). */
export interface GoalSeekRequest {
  free: DesignFree[];
  targets: DesignTarget[];
}

/** Answer of goalSeek. */
export interface GoalSeekResult {
  /** `met`: every target met; `closest`: the least-squares compromise within the bounds; `infeasible`: no valid part within the bounds. */
  status: GoalSeekStatus;
  /** The changed part document (the input one when infeasible). */
  part: PartDocument;
  /** Its spin report. */
  report: SpinReport;
  achieved: AchievedTarget[];
  /** The parameters that changed, in the order of `free` (a named parameter without `primitive`, its name as `parameter`). */
  changes: DesignChange[];
  /** Why not every target is met (closest, infeasible). */
  reason?: string;
}

/** Relative tolerance of an equality (or bound) target; 1e-6 absolute when the target is 0. */
export const TARGET_TOLERANCE = 1e-3;
const ZERO_TARGET_TOLERANCE = 1e-6;

/** Scale of a figure's residual when its target is 0 (SI; a typical size of the figure). */
const TYPICAL: Readonly<Record<DesignFigure, number>> = {
  mass: 0.1,
  balancePoint: 0.01,
  swingweight: 1e-4,
  twistweight: 1e-4,
  pivotMoment: 1e-4,
  centreOfPercussion: 0.01,
  steadyMargin: 0.01,
  I1: 1e-4,
  I2: 1e-4,
  I3: 1e-4,
};

/** Residual of a target whose figure does not exist at a point (no centre of percussion): large, so the solver leaves such points. */
const UNREACHABLE = 1e3;
/** ½·Σr² at which a run stops: residuals near 1e-8 of their scales, far inside the 0.1 % a target allows. */
const COST_TOLERANCE = 1e-16;
/** Largest |r_j| at which a run stops: 1e-6 of the target's scale, a thousand times inside the tolerance. */
const RESIDUAL_TOLERANCE = 1e-6;
/** Starting points tried after the document's own when the targets are not met. */
const EXTRA_STARTS = 4;
/** Points sampled for a valid start when the document's own and the extra starts are all invalid. */
const SEARCH_POINTS = 64;

/**
 * Design to target (MECHANICS §9): changes the free parameters of a validated part document within
 * their bounds so that its figures meet the targets, as bounded nonlinear least squares over the
 * residuals r_j = (f_j(p) − t_j)/s_j, s_j = |t_j| (a typical size of the figure when t_j = 0);
 * a min or max target is a one-sided residual, zero while it holds; a centre of percussion that does
 * not exist is a large residual. Solved by boundedLevenbergMarquardt (projected, bounds exact) from
 * the document's values (clamped into the bounds), then, if the targets are not met, from the
 * bounds' centre and three seeded points; the best answer is kept.
 *
 * A target is met within 0.1 % of its value (1e-6 absolute for a target of 0) or of its bound.
 * `infeasible` means no point within the bounds gives a valid part: a relation between a
 * primitive's fields fails at every point (checked exactly at the corners of its free dimensions,
 * since each relation is monotone in each field), or every point tried (the start, the extra
 * starts and 64 seeded points) fails (e.g. a removal larger than what it cuts everywhere). Bounds
 * that merely keep a figure from its target give `closest`, with the bound active exactly.
 *
 * A free named parameter (`{ param, min, max }`) moves every field that refers to it; the answer's
 * part then holds its new value in `parameters` and every such field resolved again.
 *
 * Throws EngineInputError('invalid') for a bad request: the settings' schema (paths `free[i].max`,
 * `targets[i].value`, …), an unknown primitive (`free[i].primitive`), a field the primitive lacks
 * or one that follows a named parameter (`free[i].parameter`), an unknown named parameter or one no
 * field refers to (`free[i].param`), bounds outside a field's rule (`free[i].min`, `free[i].max`),
 * a grip figure on a part without grip (`targets[i].figure`); ('unanalysable') when the document
 * itself cannot be analysed.
 */
export function goalSeek(doc: PartDocument, request: GoalSeekRequest, options: DesignOptions = {}): GoalSeekResult {
  const parsed = goalSeekSettingsSchema.safeParse(request);
  if (!parsed.success)
    throw new EngineInputError(
      'invalid',
      parsed.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    );
  const { free, targets } = parsed.data;
  const figures = checkFigureNames(
    doc,
    targets.map((t) => t.figure),
    (i) => `targets[${i}].figure`,
  );
  const mp = partMassProperties(doc, options);
  const ctx = figureContext(doc, mp, options);
  const model = new DesignModel(doc, mp, free, (i) => `free[${i}]`, ctx.equalMoments);
  checkBounds(free, model);

  const n = free.length;
  const lower = Float64Array.from(free, (f) => f.min),
    upper = Float64Array.from(free, (f) => f.max);
  const scales = targets.map((t, j) => {
    const ref = t.value ?? t.min ?? t.max!;
    return ref !== 0 ? Math.abs(ref) : TYPICAL[figures[j]];
  });
  const values = new Float64Array(figures.length);
  const measure = (x: ArrayLike<number>): Float64Array | null => {
    if (model.evaluate(x) !== null) return null;
    figuresFromBody(model.body, model.principal, ctx, figures, values);
    return values;
  };
  const problem: BoundedProblem = {
    lower,
    upper,
    // A single target still gets two rows (the second always 0), so the Jacobian is never a lone row.
    residualCount: Math.max(2, targets.length),
    residuals(x, out) {
      const f = measure(x);
      if (!f) return false;
      out.fill(0);
      targets.forEach((t, j) => (out[j] = residualOf(t, f[j], scales[j])));
      return true;
    },
  };

  const start = Float64Array.from(model.start, (v, i) => Math.min(upper[i], Math.max(lower[i], v)));
  const relations = impossibleRelation(model, lower, upper);
  const startProblem = model.evaluate(start);
  const infeasible = (why: string): GoalSeekResult => {
    const f = measure(model.start);
    return {
      status: 'infeasible',
      part: doc,
      report: analyzeValidatedPart(doc, options),
      achieved: achievedOf(targets, figures, f),
      changes: [],
      reason: `No values within the bounds give a valid part: ${why}. The part is unchanged.`,
    };
  };
  if (relations) return infeasible(relations);

  const rng = new SeededRandom(0x5eed);
  const randomPoint = () => Float64Array.from(lower, (l, i) => l + rng.uniform() * (upper[i] - l));
  const starts: Float64Array[] = [start, Float64Array.from(lower, (l, i) => (l + upper[i]) / 2)];
  for (let k = 0; k < EXTRA_STARTS - 1; k++) starts.push(randomPoint());
  if (startProblem !== null && starts.every((s) => model.evaluate(s) !== null)) {
    let found: Float64Array | null = null;
    for (let k = 0; k < SEARCH_POINTS && !found; k++) {
      const p = randomPoint();
      if (model.evaluate(p) === null) found = p;
    }
    if (!found) return infeasible(`${startProblem} (and at every other point tried)`);
    starts.push(found);
  }

  const maxIterations = Math.max(1, Math.min(1000, Math.floor(options.maxIterations ?? 100)));
  let best: LeastSquaresResult | null = null;
  let bestMet = false;
  for (const s of starts) {
    if (model.evaluate(s) !== null) continue;
    const run = boundedLevenbergMarquardt(problem, s, {
      maxIterations,
      costTolerance: COST_TOLERANCE,
      residualTolerance: RESIDUAL_TOLERANCE,
    });
    const f = measure(run.x);
    const met = f !== null && targets.every((t, j) => isMet(t, f[j]));
    if (!best || (met && !bestMet) || (met === bestMet && run.cost < best.cost)) {
      best = run;
      bestMet = met;
    }
    if (met) break;
  }
  const x = best!.x;
  const f = measure(x)!;
  const achieved = achievedOf(targets, figures, f);
  let part = doc;
  const changes: DesignChange[] = [];
  free.forEach((q, i) => {
    if (x[i] === model.start[i]) return;
    if (q.param !== undefined) {
      part = withNamedParameter(part, q.param, x[i]);
      changes.push({ parameter: q.param, from: model.start[i], to: x[i] });
    } else {
      part = replaceParameter(part, q.primitive!, q.parameter!, x[i]);
      changes.push({ primitive: q.primitive!, parameter: q.parameter!, from: model.start[i], to: x[i] });
    }
  });
  const status: GoalSeekStatus = achieved.every((a) => a.met) ? 'met' : 'closest';
  const result: GoalSeekResult = { status, part, report: analyzeValidatedPart(part, options), achieved, changes };
  if (status === 'closest') result.reason = closestReason(achieved, free, x, n);
  return result;
}

/** Residual of one target at figure value f (NaN: the figure does not exist there). */
function residualOf(t: DesignTarget, f: number, scale: number): number {
  if (Number.isNaN(f)) return UNREACHABLE;
  if (t.value !== undefined) return (f - t.value) / scale;
  if (t.min !== undefined && f < t.min) return (t.min - f) / scale;
  if (t.max !== undefined && f > t.max) return (f - t.max) / scale;
  return 0;
}

/** Allowed miss of a target value or bound. */
function toleranceOf(target: number): number {
  return target === 0 ? ZERO_TARGET_TOLERANCE : TARGET_TOLERANCE * Math.abs(target);
}

/** Whether figure value f meets target t within the tolerance. */
function isMet(t: DesignTarget, f: number): boolean {
  if (Number.isNaN(f)) return false;
  if (t.value !== undefined) return Math.abs(f - t.value) <= toleranceOf(t.value);
  if (t.min !== undefined && f < t.min - toleranceOf(t.min)) return false;
  if (t.max !== undefined && f > t.max + toleranceOf(t.max)) return false;
  return true;
}

function achievedOf(targets: DesignTarget[], figures: DesignFigure[], f: Float64Array | null): AchievedTarget[] {
  return targets.map((t, j) => {
    const v = f && !Number.isNaN(f[j]) ? f[j] : null;
    const target: AchievedTarget['target'] = {};
    if (t.value !== undefined) target.value = t.value;
    if (t.min !== undefined) target.min = t.min;
    if (t.max !== undefined) target.max = t.max;
    return { figure: figures[j], value: v, target, met: v !== null && isMet(t, v) };
  });
}

/**
 * Bounds outside a field's own rule (e.g. a negative radius) are refused, naming free[i].min or
 * free[i].max. A named parameter's bound is checked through every field that refers to it; each
 * field is linear in the parameter, so both bounds within the rule keep every value between them within it.
 */
function checkBounds(free: DesignFree[], model: DesignModel): void {
  const issues: InputIssue[] = [];
  free.forEach((q, i) => {
    const bound = model.parameters[i];
    for (const end of ['min', 'max'] as const) {
      for (const t of bound.targets) {
        const v = t.scale * q[end] + t.offset;
        const bad = domainProblem(t.domain, v);
        if (!bad) continue;
        issues.push({
          path: `free[${i}].${end}`,
          message:
            bound.name === undefined ? `${bad} (${t.field} of ${t.primitive})` : `makes ${t.field} of ${t.primitive} ${v}, which ${bad}`,
        });
        break;
      }
    }
  });
  if (issues.length > 0) throw new EngineInputError('invalid', issues);
}

/**
 * A relation between a primitive's fields (inner radius below radius, …) that fails at every point
 * within the bounds, or null. Each relation is monotone in each field, so it holds somewhere in the
 * box exactly when it holds at one of the corners of that primitive's free dimensions. A primitive
 * moved by a named parameter is left to the sampled starts: one parameter may set two of its fields
 * at once, and a corner is then no longer the best point.
 */
function impossibleRelation(model: DesignModel, lower: Float64Array, upper: Float64Array): string | null {
  const byPiece = new Map<string, number[]>();
  const named = new Set<string>();
  model.parameters.forEach((q: BoundParameter, i) => {
    for (const t of q.targets) {
      if (t.slot.kind !== 'dimension') continue;
      if (q.name !== undefined) {
        named.add(t.primitive);
        continue;
      }
      const list = byPiece.get(t.primitive) ?? [];
      list.push(i);
      byPiece.set(t.primitive, list);
    }
  });
  for (const [id, list] of byPiece) {
    if (named.has(id)) continue;
    const primitive = model.doc.primitives.find((p) => p.id === id)!;
    const base = model.pieceDimensions(id);
    let first: string | null = null;
    let possible = false;
    for (let mask = 0; mask < 1 << list.length && !possible; mask++) {
      const d = [...base];
      list.forEach((i, b) => {
        const slot = model.parameters[i].targets[0].slot;
        if (slot.kind === 'dimension') d[slot.slot] = mask & (1 << b) ? upper[i] : lower[i];
      });
      const problem = relationProblem(primitive.shape, d);
      if (problem === null) possible = true;
      else first ??= problem;
    }
    if (!possible) return `${id}: ${first} at every point within the bounds`;
  }
  return null;
}

/** The document with one parameter replaced (all values are checked together by the model beforehand). */
function replaceParameter(doc: PartDocument, id: string, parameter: NonNullable<DesignFree['parameter']>, value: number): PartDocument {
  const primitives = doc.primitives.slice();
  const k = primitives.findIndex((p) => p.id === id);
  primitives[k] = withParameter(primitives[k], parameter, value);
  return { ...doc, primitives };
}

/** A short SI number for messages. */
function fmt(v: number, unit: string): string {
  const s = Number(v.toPrecision(4)).toString();
  return unit ? `${s} ${unit}` : s;
}

/** Plain reason of a `closest` answer: the targets not met and the free parameters held at a bound. */
function closestReason(achieved: AchievedTarget[], free: DesignFree[], x: Float64Array, n: number): string {
  const misses = achieved
    .filter((a) => !a.met)
    .map((a) => {
      const u = DESIGN_FIGURE_UNITS[a.figure];
      if (a.value === null) return `${a.figure} does not exist at the closest point (the centre of mass is not beyond the pivot)`;
      if (a.target.value !== undefined) {
        const off = a.target.value !== 0 ? ` (${(((a.value - a.target.value) / Math.abs(a.target.value)) * 100).toFixed(2)} %)` : '';
        return `${a.figure} reaches ${fmt(a.value, u)} against the target ${fmt(a.target.value, u)}${off}`;
      }
      if (a.target.min !== undefined && a.value < a.target.min)
        return `${a.figure} stays at ${fmt(a.value, u)}, below its minimum ${fmt(a.target.min, u)}`;
      return `${a.figure} stays at ${fmt(a.value, u)}, above its maximum ${fmt(a.target.max!, u)}`;
    });
  const held: string[] = [];
  for (let i = 0; i < n; i++) {
    const q = free[i];
    const what = q.param !== undefined ? `the parameter ${q.param}` : `${q.primitive} ${q.parameter}`;
    if (x[i] === q.min) held.push(`${what} at its min ${Number(q.min.toPrecision(6))}`);
    else if (x[i] === q.max) held.push(`${what} at its max ${Number(q.max.toPrecision(6))}`);
  }
  const bounds = held.length > 0 ? ` Held at a bound: ${held.join('; ')}.` : '';
  return `Not every target can be met within the bounds: ${misses.join('; ')}. This is the closest least-squares compromise.${bounds}`;
}
