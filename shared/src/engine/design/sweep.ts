import { sweepSettingsSchema, type DesignFigure, type SweepAnswer, type SweepAxis, type SweepPoint } from '../../schemas/design-targets';
import type { PartDocument } from '../../schemas/part-document';
import { EngineInputError, formatPath } from '../part/engine-input-error';
import { partMassProperties } from '../part/part-mass-properties';
import { checkFigureNames, figureContext, figuresFromBody, type DesignOptions } from './design-figures';
import { DesignModel } from './design-model';

/** What sweepDesign is asked: one or two axes and the figures to record at every point. */
export interface DesignSweepRequest {
  axes: SweepAxis[];
  figures: DesignFigure[];
}

/** Answer of sweepDesign (see SweepAnswer). */
export type SweepResult = SweepAnswer;

/** Progress of a running sweep. */
export type SweepProgress = (done: number, total: number) => void;

/** `steps` evenly spaced values from `from` to `to`, both ends exact. */
export function gridValues(from: number, to: number, steps: number): number[] {
  return Array.from({ length: steps }, (_, k) => (k === steps - 1 ? to : from + ((to - from) * k) / (steps - 1)));
}

/**
 * Steps one or two parameters of a validated part document over a grid and records, at every point,
 * the verdict and the nearest principal axis of the intended spin (classifySpin) and the named
 * figures (SI, as designFigures). Points come in row-major order: the first axis varies slowest.
 * A point whose values make the part invalid (a field outside its rule, inner radius ≥ radius,
 * removals that leave no mass, …) gets verdict, axis and figures null and a short `error`; a centre
 * of percussion that does not exist is null. Each point recomputes only the swept primitives
 * (DesignModel); an axis over a named parameter (`{ param, from, to, steps }`) moves every field
 * that refers to it, and appears in the answer's axes as `{ parameter: name }` without `primitive`. Throws EngineInputError('invalid') for a bad request (paths `axes[i].steps`,
 * `axes[i].primitive`, `axes[i].parameter`, `figures[i]`, …) and ('unanalysable') when the document
 * itself cannot be analysed.
 */
export function sweepDesign(
  doc: PartDocument,
  request: DesignSweepRequest,
  options: DesignOptions = {},
  onProgress?: SweepProgress,
): SweepResult {
  const parsed = sweepSettingsSchema.safeParse(request);
  if (!parsed.success)
    throw new EngineInputError(
      'invalid',
      parsed.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    );
  const { axes } = parsed.data;
  const figures = checkFigureNames(doc, parsed.data.figures, (i) => `figures[${i}]`);
  const mp = partMassProperties(doc, options);
  const ctx = figureContext(doc, mp, options);
  const model = new DesignModel(doc, mp, axes, (i) => `axes[${i}]`, ctx.equalMoments);
  const grids = axes.map((a) => gridValues(a.from, a.to, a.steps));
  const total = grids.reduce((n, g) => n * g.length, 1);
  const inner = grids.length === 2 ? grids[1].length : 1;
  const x = new Float64Array(axes.length);
  const f = new Float64Array(figures.length);
  const points: SweepPoint[] = [];
  const every = Math.max(1, Math.floor(total / 100));
  for (let k = 0; k < total; k++) {
    x[0] = grids[0][Math.floor(k / inner)];
    if (grids.length === 2) x[1] = grids[1][k % inner];
    const values = Array.from(x);
    const error = model.evaluate(x);
    if (error !== null) {
      const nulls: Record<string, number | null> = {};
      for (const name of figures) nulls[name] = null;
      points.push({ values, verdict: null, nearestAxis: null, figures: nulls, error });
    } else {
      const spin = figuresFromBody(model.body, model.principal, ctx, figures, f);
      const record: Record<string, number | null> = {};
      figures.forEach((name, j) => (record[name] = Number.isNaN(f[j]) ? null : f[j]));
      points.push({ values, verdict: spin.verdict, nearestAxis: spin.nearestAxis, figures: record });
    }
    if (onProgress && ((k + 1) % every === 0 || k + 1 === total)) onProgress(k + 1, total);
  }
  return {
    axes: axes.map((a, i) =>
      a.param !== undefined
        ? { parameter: a.param, values: grids[i] }
        : { primitive: a.primitive!, parameter: a.parameter!, values: grids[i] },
    ),
    figures,
    points,
  };
}
