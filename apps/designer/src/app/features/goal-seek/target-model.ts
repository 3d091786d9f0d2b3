import { fromDisplay, steadyMargin, toDisplay, type SpinReport } from '@tumblewise/engine';
import { DESIGN_FIGURES, GRIP_FIGURES, type DesignFigure, type DesignTarget } from '@tumblewise/shared';
import { roundSignificant } from '../part-editor/display-value';
import { formatFigure } from '../spin-report/report-figures';

/** How a target holds its figure: equal to a value, or a bound. */
export type TargetKind = 'equal' | 'atLeast' | 'atMost';

/** One target as the form holds it (value in the figure's display unit; null while empty). */
export interface TargetChoice {
  figure: DesignFigure;
  kind: TargetKind;
  value: number | null;
}

/** Names of the figures on screen. */
export const FIGURE_LABELS: Readonly<Record<DesignFigure, string>> = {
  mass: 'Mass',
  balancePoint: 'Balance point',
  swingweight: 'Swingweight',
  twistweight: 'Twistweight',
  pivotMoment: 'Moment about the pivot',
  centreOfPercussion: 'Centre of percussion',
  steadyMargin: 'Steady margin',
  I1: 'Principal moment I1',
  I2: 'Principal moment I2',
  I3: 'Principal moment I3',
};

/** The kinds of target in the form's order, with their words. */
export const TARGET_KINDS: readonly { kind: TargetKind; label: string; sign: string }[] = [
  { kind: 'equal', label: 'equal to', sign: '=' },
  { kind: 'atLeast', label: 'at least', sign: '≥' },
  { kind: 'atMost', label: 'at most', sign: '≤' },
];

/** The figures in the order the form offers them. */
export const FIGURES: readonly DesignFigure[] = DESIGN_FIGURES;

/** Whether a figure is measured in the grip frame (the draft needs a grip for it). */
export function needsGrip(figure: DesignFigure): boolean {
  return GRIP_FIGURES.includes(figure);
}

/** Display unit of each figure: g, mm, kg·cm² for moments, % for the margin. */
export const FIGURE_UNITS: Readonly<Record<DesignFigure, string>> = {
  mass: 'g',
  balancePoint: 'mm',
  swingweight: 'kg·cm²',
  twistweight: 'kg·cm²',
  pivotMoment: 'kg·cm²',
  centreOfPercussion: 'mm',
  steadyMargin: '%',
  I1: 'kg·cm²',
  I2: 'kg·cm²',
  I3: 'kg·cm²',
};

/** Significant digits kept in SI after conversion (clears binary noise, as the editor does). */
const SI_DIGITS = 12;

/** A figure's SI value (kg, m, kg·m², ratio) in its display unit, through the engine's unit conversion. */
export function figureToDisplay(figure: DesignFigure, si: number): number {
  switch (FIGURE_UNITS[figure]) {
    case 'g':
      return toDisplay(si, 'mass', 'g');
    case 'mm':
      return toDisplay(si, 'length', 'mm');
    case 'kg·cm²':
      return toDisplay(si, 'inertia', 'kg·cm²');
    default:
      return si * 100;
  }
}

/** A value typed in a figure's display unit, in SI for the request. */
export function figureFromDisplay(figure: DesignFigure, shown: number): number {
  let si: number;
  switch (FIGURE_UNITS[figure]) {
    case 'g':
      si = fromDisplay(shown, 'mass', 'g');
      break;
    case 'mm':
      si = fromDisplay(shown, 'length', 'mm');
      break;
    case 'kg·cm²':
      si = fromDisplay(shown, 'inertia', 'kg·cm²');
      break;
    default:
      si = shown / 100;
  }
  return roundSignificant(si, SI_DIGITS);
}

/** A figure's SI value written for the screen with its unit ("412.5 g"); a dash when it does not exist. */
export function showFigure(figure: DesignFigure, si: number | null | undefined): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  const unit = FIGURE_UNITS[figure];
  return `${formatFigure(figureToDisplay(figure, si))}${unit === '%' ? ' %' : ` ${unit}`}`;
}

/** What is wrong with a target typed in the form (null when it is fine). */
export function targetProblem(choice: TargetChoice): string | null {
  if (choice.value === null || !Number.isFinite(choice.value)) return 'is required';
  const positive = choice.figure === 'mass' || /^(I\d|swingweight|twistweight|pivotMoment)$/.test(choice.figure);
  if (positive && choice.kind === 'equal' && !(choice.value > 0)) return 'must be greater than zero';
  return null;
}

/** A target of the form in the request's SI shape. */
export function targetRequest(choice: TargetChoice): DesignTarget {
  if (choice.value === null) throw new Error(`target ${choice.figure} has no value`);
  const si = figureFromDisplay(choice.figure, choice.value);
  if (choice.kind === 'atLeast') return { figure: choice.figure, min: si };
  if (choice.kind === 'atMost') return { figure: choice.figure, max: si };
  return { figure: choice.figure, value: si };
}

/** A request target in words: "swingweight 320 kg·cm²", "mass ≥ 250 g", "balance point ≤ 300 mm". */
export function targetText(target: { figure: DesignFigure; value?: number; min?: number; max?: number }): string {
  const name = target.figure.startsWith('I') ? target.figure : FIGURE_LABELS[target.figure].toLowerCase();
  if (target.value !== undefined) return `${name} ${showFigure(target.figure, target.value)}`;
  if (target.min !== undefined && target.max !== undefined)
    return `${name} ${showFigure(target.figure, target.min)} to ${showFigure(target.figure, target.max)}`;
  if (target.min !== undefined) return `${name} ≥ ${showFigure(target.figure, target.min)}`;
  return `${name} ≤ ${showFigure(target.figure, target.max)}`;
}

/**
 * The figures of a spin report by design-figure name (SI), null where the report has none (no grip
 * frame, no centre of percussion). The steady margin is the engine's, from the principal moments
 * and the role of the axis nearest the intended spin.
 */
export function currentFigures(report: SpinReport): Record<DesignFigure, number | null> {
  const [i1, i2, i3] = report.principal.moments;
  return {
    mass: report.mass,
    balancePoint: report.trade.balancePoint,
    swingweight: report.trade.swingweight,
    twistweight: report.trade.twistweight,
    pivotMoment: report.trade.pivot?.moment ?? null,
    centreOfPercussion: report.trade.pivot?.centreOfPercussion ?? null,
    steadyMargin: steadyMargin(report.principal.moments, report.spin.nearestAxis),
    I1: i1,
    I2: i2,
    I3: i3,
  };
}

/** A figure's current value as a starting value for its target field (4 significant digits, display unit). */
export function startingValue(figure: DesignFigure, si: number | null | undefined): number | null {
  return si === null || si === undefined || !Number.isFinite(si) ? null : roundSignificant(figureToDisplay(figure, si), 4);
}
