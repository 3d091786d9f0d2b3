import { toDisplay } from '@tumblewise/engine';
import type { ComparisonRow } from '@tumblewise/shared';

/** How a comparison row's SI unit is shown: the display unit and the conversion of a value (and of a difference) into it. */
export interface DisplayUnit {
  unit: string;
  convert: (si: number) => number;
}

/**
 * Display units of the compare screen (PRODUCT.md: g, mm, g·cm²; ratios as per cent), converted
 * through the engine's unit system. Every conversion here is linear, so a delta converts like a value.
 */
const DISPLAY: Record<string, DisplayUnit> = {
  kg: { unit: 'g', convert: (v) => toDisplay(v, 'mass', 'g') },
  m: { unit: 'mm', convert: (v) => toDisplay(v, 'length', 'mm') },
  'kg·m²': { unit: 'g·cm²', convert: (v) => toDisplay(v, 'inertia', 'g·cm²') },
  '': { unit: '%', convert: (v) => v * 100 },
};

/** The display unit of an SI unit; units without a display form (°, s, 1/s, rad/s) are shown as they are. */
export function displayUnitOf(siUnit: string): DisplayUnit {
  return DISPLAY[siUnit] ?? { unit: siUnit, convert: (v) => v };
}

const numberFormat = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 });

/** A number to four significant digits, grouped in thousands ("1,234", "0.4121"). */
export function formatNumber(x: number): string {
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs >= 1e9 || abs < 1e-4) return x.toExponential(3);
  return numberFormat.format(x);
}

/** One cell of the table: the value in its display unit ("412.5 g"), a word, or a dash. */
export function formatValue(value: number | string | null, siUnit: string): string {
  if (value === null) return '—';
  if (typeof value === 'string') return value;
  const d = displayUnitOf(siUnit);
  const unit = d.unit === '%' ? ' %' : d.unit === '°' ? '°' : d.unit ? ` ${d.unit}` : '';
  return `${formatNumber(d.convert(value))}${unit}`;
}

/** A signed difference against the baseline with its relative size ("+3.2 g (+0.8 %)"); empty for text rows and missing figures. */
export function formatDelta(row: ComparisonRow, index: number): string {
  const delta = row.deltas[index];
  if (delta === null) return '';
  const d = displayUnitOf(row.unit);
  const v = d.convert(delta);
  const unit = d.unit === '%' ? ' points' : d.unit === '°' ? '°' : d.unit ? ` ${d.unit}` : '';
  const sign = v > 0 ? '+' : v < 0 ? '−' : '±';
  const rel = row.relativeDeltas[index];
  const relText = rel === null ? '' : ` (${rel > 0 ? '+' : rel < 0 ? '−' : '±'}${formatNumber(Math.abs(rel) * 100)} %)`;
  return `${sign}${formatNumber(Math.abs(v))}${unit}${relText}`;
}
