import { toDisplay } from '@tumblewise/engine';
import { DESIGN_FIGURES, GRIP_FIGURES, type DesignFigure } from '@tumblewise/shared';
import { formatFigure } from '../spin-report/report-figures';

/** How a sweep figure is shown: its name, display unit, and the conversion from SI. */
export interface FigureDisplay {
  figure: DesignFigure;
  /** Name on screen, as the spin report names it. */
  label: string;
  /** Display unit ('%' for the steady margin). */
  unit: string;
  /** SI → display unit. */
  convert: (si: number) => number;
}

const grams = (kg: number) => toDisplay(kg, 'mass', 'g');
const millimetres = (m: number) => toDisplay(m, 'length', 'mm');
const kgCm2 = (kgm2: number) => toDisplay(kgm2, 'inertia', 'kg·cm²');

/** Every figure's display, in the order the figures are listed. */
export const FIGURE_DISPLAY: Readonly<Record<DesignFigure, FigureDisplay>> = {
  steadyMargin: { figure: 'steadyMargin', label: 'Steady margin', unit: '%', convert: (x) => 100 * x },
  mass: { figure: 'mass', label: 'Mass', unit: 'g', convert: grams },
  balancePoint: { figure: 'balancePoint', label: 'Balance point', unit: 'mm', convert: millimetres },
  swingweight: { figure: 'swingweight', label: 'Swingweight', unit: 'kg·cm²', convert: kgCm2 },
  twistweight: { figure: 'twistweight', label: 'Twistweight', unit: 'kg·cm²', convert: kgCm2 },
  pivotMoment: { figure: 'pivotMoment', label: 'Pivot moment', unit: 'kg·cm²', convert: kgCm2 },
  centreOfPercussion: { figure: 'centreOfPercussion', label: 'Centre of percussion', unit: 'mm', convert: millimetres },
  I1: { figure: 'I1', label: 'Principal moment I1', unit: 'kg·cm²', convert: kgCm2 },
  I2: { figure: 'I2', label: 'Principal moment I2', unit: 'kg·cm²', convert: kgCm2 },
  I3: { figure: 'I3', label: 'Principal moment I3', unit: 'kg·cm²', convert: kgCm2 },
};

/** The figures a part can have: the grip-frame ones only when it has a grip. The steady margin comes first. */
export function availableFigures(hasGrip: boolean): DesignFigure[] {
  const order: DesignFigure[] = ['steadyMargin', ...DESIGN_FIGURES.filter((f) => f !== 'steadyMargin')];
  return order.filter((f) => hasGrip || !GRIP_FIGURES.includes(f));
}

/** A figure's SI value as the screen writes it ("12.5 %", "−0.3 %", "412 g", "—" when the figure does not exist there). */
export function showFigure(figure: DesignFigure, si: number | null | undefined): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  const d = FIGURE_DISPLAY[figure];
  return `${formatFigure(d.convert(si), 4).replace(/^-/, '−')} ${d.unit}`;
}
