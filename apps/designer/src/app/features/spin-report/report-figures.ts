import { toDisplay } from '@tumblewise/engine';
import type { CategoryCheck } from '@tumblewise/engine';

/** A figure with its unit, ready for the screen. */
export interface Shown {
  value: string;
  unit: string;
}

/** What a figure the report leaves out (null) shows: a dash, and no unit after it. */
const NOT_GIVEN: Shown = { value: '—', unit: '' };

/** A number to `digits` significant digits without exponent noise ("13.5", "0.000412", "1.23e+6" only when huge). */
export function formatFigure(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs >= 1e7 || abs < 1e-6) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}

/** Mass (kg) in grams. */
export function showMass(kg: number): Shown {
  return { value: formatFigure(toDisplay(kg, 'mass', 'g')), unit: 'g' };
}

/** Length (m) in millimetres; a figure the report does not give is a dash without a unit. */
export function showLength(m: number | null): Shown {
  return m === null ? NOT_GIVEN : { value: formatFigure(toDisplay(m, 'length', 'mm')), unit: 'mm' };
}

/** Volume (m³) in cm³. */
export function showVolume(m3: number): Shown {
  return { value: formatFigure(toDisplay(m3, 'volume', 'cm³')), unit: 'cm³' };
}

/** The inertia unit for a set of moments (kg·m²): kg·cm² from 1 kg·cm² up, g·cm² for small parts. */
export function inertiaUnitFor(moments: readonly (number | null)[]): 'kg·cm²' | 'g·cm²' {
  const largest = Math.max(0, ...moments.filter((m): m is number => m !== null && Number.isFinite(m)).map(Math.abs));
  return largest >= 1e-4 ? 'kg·cm²' : 'g·cm²';
}

/** A moment of inertia (kg·m²) in the given display unit. */
export function showInertia(kgm2: number | null, unit: 'kg·cm²' | 'g·cm²'): Shown {
  return kgm2 === null ? NOT_GIVEN : { value: formatFigure(toDisplay(kgm2, 'inertia', unit)), unit };
}

/** A spin rate (rad/s) in revolutions per second. */
export function showRate(radPerSecond: number): Shown {
  return { value: formatFigure(toDisplay(radPerSecond, 'rate', 'rev/s'), 3), unit: 'rev/s' };
}

/** A relative margin as a percentage. */
export function showPercent(fraction: number): string {
  return `${formatFigure(100 * fraction, 3)} %`;
}

/**
 * Turns the part makes before its first flip: the flip time (s) times the spin rate (rad/s) over
 * 2π rad per turn. Null without a flip time.
 */
export function turnsBeforeFlip(flipTime: number | null, rate: number | null): number | null {
  if (flipTime === null || rate === null || !Number.isFinite(flipTime) || !Number.isFinite(rate)) return null;
  return (flipTime * rate) / (2 * Math.PI);
}

/** A category check's value and limits in display units (g, mm, kg·cm², cm³); other units as given. */
export function showCheck(check: CategoryCheck): { value: string; limit: string; unit: string } {
  const convert = (x: number): string => {
    switch (check.unit) {
      case 'kg':
        return formatFigure(toDisplay(x, 'mass', 'g'));
      case 'm':
        return formatFigure(toDisplay(x, 'length', 'mm'));
      case 'kg·m²':
        return formatFigure(toDisplay(x, 'inertia', 'kg·cm²'));
      case 'm³':
        return formatFigure(toDisplay(x, 'volume', 'cm³'));
      default:
        return formatFigure(x);
    }
  };
  const unit = ({ kg: 'g', m: 'mm', 'kg·m²': 'kg·cm²', 'm³': 'cm³' } as Record<string, string>)[check.unit] ?? check.unit;
  const { min, max } = check.limit;
  const limit =
    min !== undefined && max !== undefined
      ? `${convert(min)} to ${convert(max)}`
      : min !== undefined
        ? `at least ${convert(min)}`
        : max !== undefined
          ? `at most ${convert(max)}`
          : '—';
  return { value: check.value === null ? '—' : convert(check.value), limit, unit };
}

/** A unit direction written as "(0.000, 1.000, 0.000)". */
export function showDirection(v: readonly number[]): string {
  return `(${v.map((c) => (Math.abs(c) < 5e-4 ? 0 : c).toFixed(3)).join(', ')})`;
}
