import { z } from 'zod';
import { parameterNameSchema, partDocumentSchema, REFERABLE_FIELDS } from './part-document';

/**
 * Design to target: the request bodies of a goal seek (free parameters within bounds, target
 * figures) and of a design sweep (one or two parameters stepped over a grid), and their answers.
 * SI units throughout (kg, m, kg/m³, kg·m²).
 *
 * A free parameter (or sweep axis) is either one primitive's numeric field,
 * `{ "primitive": "grip", "parameter": "radius", … }`, named as in the part document with `.0`,
 * `.1`, `.2` for the components of a triple; or one of the part's named parameters,
 * `{ "param": "hoopRadius", … }`, which moves every field that refers to it (each as
 * scale × value + offset). A field that refers to a named parameter is varied through that
 * parameter, never on its own. In answers (`changes`, a sweep's `axes`) a named parameter appears as
 * `{ "parameter": "hoopRadius", … }` without `primitive`.
 */

/** The primitive fields a design study may vary (the fields that may refer to a named parameter). */
export const DESIGN_PARAMETERS = REFERABLE_FIELDS;
export type DesignParameter = (typeof DESIGN_PARAMETERS)[number];

/**
 * The figures a design study can aim at or chart. All SI: mass (kg), balancePoint and
 * centreOfPercussion (m from the butt), swingweight, twistweight, pivotMoment and I1–I3 (kg·m²),
 * steadyMargin (a ratio: the intended spin axis's relative distance from becoming intermediate).
 */
export const DESIGN_FIGURES = [
  'mass',
  'balancePoint',
  'swingweight',
  'twistweight',
  'pivotMoment',
  'centreOfPercussion',
  'steadyMargin',
  'I1',
  'I2',
  'I3',
] as const;
export type DesignFigure = (typeof DESIGN_FIGURES)[number];

/** Figures measured in the grip frame: they need the part's `grip`. */
export const GRIP_FIGURES: readonly DesignFigure[] = ['balancePoint', 'swingweight', 'twistweight', 'pivotMoment', 'centreOfPercussion'];

/** SI unit of each figure, for messages ('' for a ratio). */
export const DESIGN_FIGURE_UNITS: Readonly<Record<DesignFigure, string>> = {
  mass: 'kg',
  balancePoint: 'm',
  swingweight: 'kg·m²',
  twistweight: 'kg·m²',
  pivotMoment: 'kg·m²',
  centreOfPercussion: 'm',
  steadyMargin: '',
  I1: 'kg·m²',
  I2: 'kg·m²',
  I3: 'kg·m²',
};

/** Most free parameters one goal seek may vary. */
export const MAX_FREE_PARAMETERS = 8;
/** Most targets one goal seek may aim at. */
export const MAX_DESIGN_TARGETS = 12;
/** Most grid points one sweep may evaluate. */
export const MAX_SWEEP_POINTS = 10_000;

const num = () => z.number({ error: 'must be a number' });
const primitiveId = z
  .string({ error: 'must be the text id of a primitive' })
  .trim()
  .min(1, { error: 'is required' })
  .max(64, { error: 'must be at most 64 characters' });
const parameter = z.enum(DESIGN_PARAMETERS, { error: `must be one of ${DESIGN_PARAMETERS.join(', ')}` });
const figure = z.enum(DESIGN_FIGURES, { error: `must be one of ${DESIGN_FIGURES.join(', ')}` });

/** Either `primitive` and `parameter` (a primitive's field) or `param` (a named parameter), never both. */
function checkVaried(f: { primitive?: string; parameter?: string; param?: string }, ctx: z.core.$RefinementCtx): void {
  if (f.param !== undefined) {
    for (const key of ['primitive', 'parameter'] as const)
      if (f[key] !== undefined)
        ctx.addIssue({
          code: 'custom',
          path: [key],
          message: 'does not go with param: give a named parameter (param) or a primitive and its parameter, not both',
        });
    return;
  }
  if (f.primitive === undefined)
    ctx.addIssue({ code: 'custom', path: ['primitive'], message: 'is required (or give param to vary a named parameter)' });
  if (f.parameter === undefined)
    ctx.addIssue({ code: 'custom', path: ['parameter'], message: 'is required (or give param to vary a named parameter)' });
}

/** What a free parameter or sweep axis varies, as one key (equal keys vary the same thing). */
export function variedKey(f: { primitive?: string; parameter?: string; param?: string }): string {
  return f.param !== undefined ? `p:${f.param}` : `f:${f.primitive}\u0000${f.parameter}`;
}

/** One free parameter and its bounds (inclusive, SI): a primitive's field, or a named parameter (`param`). */
export const designFreeSchema = z
  .strictObject({
    primitive: primitiveId.optional(),
    parameter: parameter.optional(),
    param: parameterNameSchema.optional(),
    min: num(),
    max: num(),
  })
  .superRefine((f, ctx) => {
    checkVaried(f, ctx);
    if (!(f.min < f.max)) ctx.addIssue({ code: 'custom', path: ['max'], message: 'must be greater than min' });
  });
export type DesignFree = z.infer<typeof designFreeSchema>;

/** One target: an exact `value`, or a `min` and/or `max` the figure must keep to (SI). */
export const designTargetSchema = z
  .strictObject({ figure, value: num().optional(), min: num().optional(), max: num().optional() })
  .superRefine((t, ctx) => {
    const bound = t.min !== undefined || t.max !== undefined;
    if (t.value !== undefined && bound)
      ctx.addIssue({ code: 'custom', path: ['value'], message: 'give either value or min and/or max, not both' });
    else if (t.value === undefined && !bound)
      ctx.addIssue({ code: 'custom', path: ['value'], message: 'is required (or give min or max)' });
    else if (t.min !== undefined && t.max !== undefined && !(t.min <= t.max))
      ctx.addIssue({ code: 'custom', path: ['max'], message: 'must be at least min' });
  });
export type DesignTarget = z.infer<typeof designTargetSchema>;

const freeList = z
  .array(designFreeSchema, { error: 'must be a list of free parameters' })
  .min(1, { error: 'must name at least one free parameter' })
  .max(MAX_FREE_PARAMETERS, { error: `must name at most ${MAX_FREE_PARAMETERS} free parameters` })
  .superRefine((list, ctx) => {
    const seen = new Map<string, number>();
    list.forEach((f, i) => {
      const key = variedKey(f);
      const first = seen.get(key);
      if (first !== undefined)
        ctx.addIssue({
          code: 'custom',
          path: [i],
          message: `repeats free[${first}] (${f.param !== undefined ? 'the same named parameter' : 'the same parameter of the same primitive'})`,
        });
      else seen.set(key, i);
    });
  });

const targetList = z
  .array(designTargetSchema, { error: 'must be a list of targets' })
  .min(1, { error: 'must hold at least one target' })
  .max(MAX_DESIGN_TARGETS, { error: `must hold at most ${MAX_DESIGN_TARGETS} targets` });

/** A goal seek's settings without the part (what the engine's goalSeek takes beside the document). */
export const goalSeekSettingsSchema = z.object({ free: freeList, targets: targetList });
export type GoalSeekSettings = z.input<typeof goalSeekSettingsSchema>;

/** Body of a goal seek request. */
export const solveRequestSchema = z.strictObject({ part: partDocumentSchema, free: freeList, targets: targetList });
export type SolveRequest = z.input<typeof solveRequestSchema>;

/** One axis of a sweep: `steps` evenly spaced values from `from` to `to`, both included; a primitive's field or a named parameter (`param`). */
export const sweepAxisSchema = z
  .strictObject({
    primitive: primitiveId.optional(),
    parameter: parameter.optional(),
    param: parameterNameSchema.optional(),
    from: num(),
    to: num(),
    steps: z
      .int({ error: 'must be a whole number' })
      .min(2, { error: 'must be at least 2' })
      .max(MAX_SWEEP_POINTS, { error: `must be at most ${MAX_SWEEP_POINTS}` }),
  })
  .superRefine((a, ctx) => {
    checkVaried(a, ctx);
    if (a.from === a.to) ctx.addIssue({ code: 'custom', path: ['to'], message: 'must differ from from' });
  });
export type SweepAxis = z.infer<typeof sweepAxisSchema>;

const axisList = z
  .array(sweepAxisSchema, { error: 'must be a list of one or two axes' })
  .min(1, { error: 'must hold one or two axes' })
  .max(2, { error: 'must hold one or two axes' })
  .superRefine((axes, ctx) => {
    if (axes.length === 2 && variedKey(axes[0]) === variedKey(axes[1])) {
      ctx.addIssue({
        code: 'custom',
        path: [1],
        message: `repeats axes[0] (${axes[1].param !== undefined ? 'the same named parameter' : 'the same parameter of the same primitive'})`,
      });
    }
    const total = axes.reduce((n, a) => n * a.steps, 1);
    if (total > MAX_SWEEP_POINTS)
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: `must give at most ${MAX_SWEEP_POINTS} points in all (the steps multiply to ${total})`,
      });
  });

const figureList = z
  .array(figure, { error: 'must be a list of figure names' })
  .min(1, { error: 'must name at least one figure' })
  .max(DESIGN_FIGURES.length, { error: `must name at most ${DESIGN_FIGURES.length} figures` })
  .superRefine((names, ctx) => {
    names.forEach((n, i) => {
      const first = names.indexOf(n);
      if (first < i) ctx.addIssue({ code: 'custom', path: [i], message: `repeats figures[${first}]` });
    });
  });

/** A sweep's settings without the part. */
export const sweepSettingsSchema = z.object({ axes: axisList, figures: figureList });
export type SweepSettings = z.input<typeof sweepSettingsSchema>;

/** Body of a sweep request. */
export const sweepRequestSchema = z.strictObject({ part: partDocumentSchema, axes: axisList, figures: figureList });
export type SweepRequest = z.input<typeof sweepRequestSchema>;

/** How far a goal seek got: every target met, the least-squares compromise, or no valid part within the bounds. */
export const GOAL_SEEK_STATUSES = ['met', 'closest', 'infeasible'] as const;
export type GoalSeekStatus = (typeof GOAL_SEEK_STATUSES)[number];

/** One target as reached: the figure's value at the answer (null when it does not exist there, e.g. no centre of percussion). */
export const achievedTargetSchema = z.object({
  figure,
  value: z.number().nullable(),
  target: z.object({ value: z.number().optional(), min: z.number().optional(), max: z.number().optional() }),
  met: z.boolean(),
});
export type AchievedTarget = z.infer<typeof achievedTargetSchema>;

/**
 * One parameter the answer changes: a primitive's field (`primitive` and `parameter`), or a named
 * parameter (`parameter` is its name, no `primitive`; every field that refers to it moves with it).
 */
export const designChangeSchema = z.object({ primitive: z.string().optional(), parameter: z.string(), from: z.number(), to: z.number() });
export type DesignChange = z.infer<typeof designChangeSchema>;

/** Answer of a goal seek: the changed part document and its spin report. */
export const solveAnswerSchema = z.object({
  status: z.enum(GOAL_SEEK_STATUSES),
  part: z.unknown(),
  report: z.unknown(),
  achieved: z.array(achievedTargetSchema),
  changes: z.array(designChangeSchema),
  reason: z.string().optional(),
});
export type SolveAnswer = z.infer<typeof solveAnswerSchema>;

/** One grid point of a sweep; verdict, axis and figures are null (with `error`) where the part is invalid. */
export const sweepPointSchema = z.object({
  values: z.array(z.number()),
  verdict: z.enum(['steady', 'watch', 'flip-prone']).nullable(),
  nearestAxis: z.enum(['major', 'intermediate', 'minor']).nullable(),
  figures: z.record(z.string(), z.number().nullable()),
  error: z.string().optional(),
});
export type SweepPoint = z.infer<typeof sweepPointSchema>;

/**
 * Answer of a sweep: the grid values of each axis (a named parameter as `parameter` without
 * `primitive`, as in `changes`) and the points in row-major order (the first axis varies slowest).
 */
export const sweepAnswerSchema = z.object({
  axes: z.array(z.object({ primitive: z.string().optional(), parameter: z.string(), values: z.array(z.number()) })),
  figures: z.array(figure),
  points: z.array(sweepPointSchema),
});
export type SweepAnswer = z.infer<typeof sweepAnswerSchema>;
