import type { SweepAnswer } from '@tumblewise/shared';
import { roundSignificant, siToDisplay } from '../part-editor/display-value';
import { CELL_LOOKS, cellClass, valuesAt, type CellClass } from './map-cells';
import { FIGURE_DISPLAY, showFigure } from './map-figures';
import { choiceName, type ParameterChoice } from './parameter-choices';

/** One line of a point's description: a name and its shown value. */
export interface ShownValue {
  name: string;
  shown: string;
}

/** A grid point as the details panel shows it. */
export interface PointDetail {
  /** Row-major index in the answer. */
  index: number;
  cls: CellClass;
  /** The class's word ("Steady", "No valid part"). */
  word: string;
  verdict: 'steady' | 'watch' | 'flip-prone' | null;
  nearestAxis: 'major' | 'intermediate' | 'minor' | null;
  /** Why the values make no valid part. */
  error: string | null;
  /** The value of each swept field (SI), in axis order. */
  values: number[];
  /** The same in display units, named. */
  shownValues: ShownValue[];
  /** The recorded figures in display units, in the answer's order. */
  figures: ShownValue[];
}

/** A value of a choice's field in its display unit ("33 mm"). */
export function showParameter(choice: Pick<ParameterChoice, 'units'>, si: number): string {
  return `${roundSignificant(siToDisplay(si, choice.units) ?? Number.NaN, 4)} ${choice.units.unit}`;
}

/**
 * The details of the grid point at row-major `index`: the swept fields' values read from the axes'
 * grids (first axis slowest), its verdict or why it is no valid part, and its figures. `choices`
 * are the swept fields in axis order. Null when the index is outside the answer.
 */
export function pointDetail(answer: SweepAnswer, choices: readonly ParameterChoice[], index: number): PointDetail | null {
  const point = answer.points[index];
  if (!point || !Number.isInteger(index)) return null;
  const values = valuesAt(answer, index);
  const cls = cellClass(point);
  return {
    index,
    cls,
    word: CELL_LOOKS[cls].word,
    verdict: point.verdict,
    nearestAxis: point.nearestAxis,
    error: point.verdict === null ? (point.error ?? 'These values make no valid part.') : null,
    values,
    shownValues: choices.map((c, k) => ({ name: choiceName(c), shown: showParameter(c, values[k]) })),
    figures: answer.figures.map((f) => ({ name: FIGURE_DISPLAY[f].label, shown: showFigure(f, point.figures[f]) })),
  };
}
