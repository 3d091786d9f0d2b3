import type { SweepAnswer, SweepPoint } from '@tumblewise/shared';
import { VERDICT_LABELS, type VerdictName } from '@tumblewise/ui';

/** What a grid point of a map shows: its verdict, or that the values make no valid part. */
export type CellClass = 'steady' | 'watch' | 'flip-prone' | 'invalid';

/** The classes in legend order, best first. */
export const CELL_CLASSES: readonly CellClass[] = ['steady', 'watch', 'flip-prone', 'invalid'];

/** How a class is drawn and named: the words and icons of the app's verdict chips, and the map's own colours. */
export interface CellLook {
  word: string;
  icon: string;
  /** One line on what the class means. */
  hint: string;
  /** Fill of the map's cells and the legend's swatch. */
  colour: string;
  /** Hatched (drawn with stripes as well as a colour). */
  hatched: boolean;
}

/** A verdict's look: the chip's word, icon and hint with the map's colour. */
function chipLook(verdict: VerdictName, colour: string): CellLook {
  const { label, icon, hint } = VERDICT_LABELS[verdict];
  return { word: label, icon, hint, colour, hatched: false };
}

/**
 * The map's palette (ours): a light blue-green, a light ochre and a dark red from the app's theme
 * ramps, apart in lightness as well as hue so the classes stay distinct for the common colour-vision
 * deficiencies; the points without a valid part pale grey with dark stripes.
 */
export const CELL_LOOKS: Readonly<Record<CellClass, CellLook>> = {
  steady: chipLook('steady', '#10bcd4'),
  watch: chipLook('watch', '#ffb964'),
  'flip-prone': chipLook('flip-prone', '#930016'),
  invalid: {
    word: 'No valid part',
    icon: 'block',
    hint: 'These values break a rule of the shape (a bore wider than its radius, no mass left, …)',
    colour: '#dce4e6',
    hatched: true,
  },
};
/** Colour of the stripes of hatched cells. */
export const HATCH_COLOUR = '#59606b';

/** The class of a grid point: its verdict, or 'invalid' when the values make no valid part (verdict null). */
export function cellClass(point: Pick<SweepPoint, 'verdict'>): CellClass {
  return point.verdict ?? 'invalid';
}

/** How many grid points fall in each class, and their share of all. */
export interface ClassShare {
  cls: CellClass;
  count: number;
  /** 0 … 1. */
  share: number;
}

/** The count and share of each class, in legend order (classes without points included, at 0). */
export function classShares(points: readonly Pick<SweepPoint, 'verdict'>[]): ClassShare[] {
  const counts = new Map<CellClass, number>(CELL_CLASSES.map((c) => [c, 0]));
  for (const p of points) counts.set(cellClass(p), (counts.get(cellClass(p)) ?? 0) + 1);
  return CELL_CLASSES.map((cls) => {
    const count = counts.get(cls) ?? 0;
    return { cls, count, share: points.length ? count / points.length : 0 };
  });
}

/** A share as a whole percentage, or to one decimal under 1 % ("62 %", "0.4 %", "0 %"). */
export function sharePercent(share: number): string {
  const p = share * 100;
  if (p === 0) return '0 %';
  return `${p < 1 ? p.toFixed(1) : Math.round(p).toString()} %`;
}

/** The text summary of a map: "Of 961 grid points: Steady 0 %, Watch 2 %, Flip-prone 62 %, No valid part 35 %." */
export function summaryText(shares: readonly ClassShare[]): string {
  const total = shares.reduce((n, s) => n + s.count, 0);
  const parts = shares.map((s) => `${CELL_LOOKS[s.cls].word} ${sharePercent(s.share)}`);
  return `Of ${total.toLocaleString('en-GB')} grid ${total === 1 ? 'point' : 'points'}: ${parts.join(', ')}.`;
}

/** The index of a grid point in the answer's row-major list: `i` along the first axis (slowest), `j` along the second. */
export function pointIndex(i: number, j: number, secondSteps: number): number {
  return i * secondSteps + j;
}

/** Where a point of the row-major list sits: `i` along the first axis, `j` along the second (0 for a line). */
export function gridCell(index: number, secondSteps: number): { i: number; j: number } {
  return { i: Math.floor(index / secondSteps), j: index % secondSteps };
}

/** Steps along the second axis of an answer (1 for a line). */
export function secondSteps(answer: Pick<SweepAnswer, 'axes'>): number {
  return answer.axes.length > 1 ? answer.axes[1].values.length : 1;
}

/** The value of each axis at a point of the answer (SI), read from the axes' grids by its row-major index. */
export function valuesAt(answer: Pick<SweepAnswer, 'axes'>, index: number): number[] {
  const { i, j } = gridCell(index, secondSteps(answer));
  return answer.axes.map((a, k) => a.values[k === 0 ? i : j]);
}

/** Index of the grid value nearest to `value` (the first of two equally near). */
export function nearestStep(grid: readonly number[], value: number): number {
  let best = 0;
  for (let k = 1; k < grid.length; k++) if (Math.abs(grid[k] - value) < Math.abs(grid[best] - value)) best = k;
  return best;
}

/** The row-major index of the grid point nearest to `values` (one per axis, in the grids' unit), axis by axis. */
export function nearestPoint(grids: readonly (readonly number[])[], values: readonly number[]): number {
  const i = nearestStep(grids[0], values[0]);
  return grids.length > 1 ? pointIndex(i, nearestStep(grids[1], values[1]), grids[1].length) : i;
}

/** A stretch of neighbouring points of a line with the same class, from its first to its last index. */
export interface ClassRun {
  cls: CellClass;
  first: number;
  last: number;
}

/** The runs of equal class along a line of points, in order. */
export function classRuns(classes: readonly CellClass[]): ClassRun[] {
  const runs: ClassRun[] = [];
  classes.forEach((cls, k) => {
    const run = runs[runs.length - 1];
    if (run && run.cls === cls) run.last = k;
    else runs.push({ cls, first: k, last: k });
  });
  return runs;
}
