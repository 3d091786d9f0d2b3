import { toDisplay } from '@tumblewise/engine';
import { DISPLAY_INERTIA_UNITS, MEASUREMENT_CSV_COLUMNS } from '@tumblewise/shared';

/** An inertia unit the screen shows moments in (the workspace's display unit). */
export type InertiaUnit = (typeof DISPLAY_INERTIA_UNITS)[number];

/**
 * Beyond this share (|Δ| in per cent) a measured moment is flagged as far from the prediction.
 * 5 % is our own choice: a rough allowance for rig error plus material and dimension scatter, not
 * a figure from any rule book. A team can read the per-cent column against its own tolerance.
 */
export const DIFFERENCE_FLAG_PERCENT = 5;

const figure = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 });

/** A number to four significant digits, grouped in thousands ("24,150", "0.01235"); tiny and huge values in exponent form. */
export function formatFigure(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs >= 1e9 || abs < 1e-4) return x.toExponential(3);
  return figure.format(x);
}

/** The value as it was entered, in the unit it was entered in ("24,150 g·cm²"). */
export function formatEntered(value: number, unit: string): string {
  return `${formatFigure(value)} ${unit}`;
}

/** A moment stored in kg·m² shown in a display unit ("24,150 g·cm²"); a dash when there is none. */
export function formatMoment(kgm2: number | null, unit: InertiaUnit): string {
  if (kgm2 === null || !Number.isFinite(kgm2)) return '—';
  return `${formatFigure(toDisplay(kgm2, 'inertia', unit))} ${unit}`;
}

/** How a difference between measured and predicted reads on the screen. */
export interface DifferenceShown {
  /** Signed, one decimal, with a true minus sign ("+3.1 %", "−2.2 %", "0.0 %"); a dash without a prediction. */
  text: string;
  /** `far` beyond the threshold, `near` within it, `none` without a prediction. */
  state: 'far' | 'near' | 'none';
  /** The same in words, for the flag beside the number and for screen readers. */
  words: string;
  /** Material icon ligature of the flag; empty without a prediction (the dash says it). */
  icon: string;
}

/** Formats `differencePercent` ((measured − predicted) / predicted × 100) and flags it beyond `threshold` per cent. */
export function describeDifference(percent: number | null, threshold = DIFFERENCE_FLAG_PERCENT): DifferenceShown {
  if (percent === null || !Number.isFinite(percent)) {
    return { text: '—', state: 'none', words: 'no prediction for this axis', icon: '' };
  }
  const rounded = Math.round(percent * 10) / 10;
  const sign = rounded > 0 ? '+' : rounded < 0 ? '−' : '';
  const text = `${sign}${Math.abs(rounded).toFixed(1)} %`;
  const direction = percent > 0 ? 'above' : 'below';
  if (Math.abs(percent) > threshold) {
    return { text, state: 'far', words: `${direction} the prediction by more than ${threshold} %`, icon: 'warning' };
  }
  return { text, state: 'near', words: `within ${threshold} % of the prediction`, icon: 'check_circle' };
}

/**
 * What a measured axis is compared with, in words, following the axis words the server recognises
 * (MEASUREMENT_AXES: a principal role or a trade axis). Null for an axis described otherwise.
 */
export function comparedWith(axis: string): string | null {
  const word = axis.trim().toLowerCase();
  if (/^(major|i1)\b/.test(word)) return 'largest principal moment I1';
  if (/^(intermediate|i2)\b/.test(word)) return 'intermediate principal moment I2';
  if (/^(minor|i3)\b/.test(word)) return 'smallest principal moment I3';
  if (/^swing/.test(word)) return 'swingweight';
  if (/^twist/.test(word)) return 'twistweight';
  if (/^pivot/.test(word)) return 'moment about the pivot';
  return null;
}

/** A few invented rig readings that show the format (the empty screen's example). */
export const EXAMPLE_CSV = [
  MEASUREMENT_CSV_COLUMNS.join(','),
  'major,24150,g·cm²,compound pendulum',
  'swing,198.4,kg·cm²,swing rig',
  'end-over-end (rig B),0.00241,kg·m²,trifilar pendulum',
].join('\n');

/**
 * A CSV to fill in: the header and one row per axis the prediction covers, value left blank, in
 * `unit` with a method to overwrite. Uploading it unfilled is refused, line by line, so a forgotten
 * row cannot be imported by accident.
 */
export function templateCsv(unit: InertiaUnit, axes: readonly string[] = ['major', 'intermediate', 'minor', 'swing', 'twist']): string {
  const rows = axes.map((axis) => [axis, '', unit, 'compound pendulum'].map(csvCell).join(','));
  return `${[MEASUREMENT_CSV_COLUMNS.join(','), ...rows].join('\r\n')}\r\n`;
}

/** One CSV cell, quoted when it holds a comma, a quote or a line break (RFC 4180). */
export function csvCell(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The file name of a variant's template ("Frame-v2-measurements.csv"). */
export function templateFileName(partName: string, variantNumber: number): string {
  const base = `${partName} v${variantNumber} measurements`.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
  return `${base || 'measurements'}.csv`;
}

/** When a reading was recorded, as a short date and time ("30 Nov 2026, 10:00"). */
export function formatRecorded(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short', ...(timeZone ? { timeZone } : {}) }).format(date);
}

/** Largest upload the server accepts (server/src/measurements: multer's 1 MB file limit). */
export const MAX_CSV_BYTES = 1024 * 1024;

/** Why a picked or dropped file is not sent, or null when it may be. */
export function fileRefusal(file: { name: string; size: number; type: string }): string | null {
  const looksCsv = /\.csv$/i.test(file.name) || file.type === 'text/csv';
  if (!looksCsv) return `“${file.name}” is not a CSV file: choose a .csv file with the header ${MEASUREMENT_CSV_COLUMNS.join(',')}.`;
  if (file.size === 0) return `“${file.name}” is empty.`;
  if (file.size > MAX_CSV_BYTES) return `“${file.name}” is larger than 1 MB; split it into smaller files.`;
  return null;
}
