import { parse } from 'csv-parse/sync';
import { fromDisplay } from '@tumblewise/engine';
import { MEASUREMENT_CSV_COLUMNS, MEASUREMENT_UNITS } from '@tumblewise/shared';

export interface MeasurementRow {
  line: number;
  axis: string;
  value: number;
  enteredValue: number;
  enteredUnit: string;
  method: string;
}

/** Reads a measured-data CSV; either every row is good, or the problems by line number. */
export function readMeasurementCsv(text: string, maxRows = 500): { ok: true; rows: MeasurementRow[] } | { ok: false; problems: string[] } {
  let records: string[][];
  try {
    records = parse(text, { bom: true, skip_empty_lines: true, trim: true, relax_column_count: true });
  } catch (err) {
    return { ok: false, problems: [`the file is not valid CSV (${(err as Error).message.slice(0, 160)})`] };
  }
  if (records.length === 0) return { ok: false, problems: ['the file is empty: give a header row axis,value,unit,method and one row per measurement'] };
  const header = records[0].map((h) => h.toLowerCase());
  if (MEASUREMENT_CSV_COLUMNS.some((c, i) => header[i] !== c)) {
    return { ok: false, problems: [`line 1: the header must be ${MEASUREMENT_CSV_COLUMNS.join(',')} (found ${records[0].join(',').slice(0, 120)})`] };
  }
  if (records.length === 1) return { ok: false, problems: ['the file has a header but no measurements'] };
  if (records.length - 1 > maxRows) return { ok: false, problems: [`the file has ${records.length - 1} rows; at most ${maxRows} are accepted`] };
  const problems: string[] = [];
  const rows: MeasurementRow[] = [];
  records.slice(1).forEach((r, i) => {
    const line = i + 2;
    if (r.length !== 4) { problems.push(`line ${line}: expected 4 columns, found ${r.length}`); return; }
    const [axis, rawValue, rawUnit, method] = r;
    const value = Number(rawValue.replace(',', '.'));
    const unit = MEASUREMENT_UNITS[rawUnit] ?? MEASUREMENT_UNITS[rawUnit.toLowerCase()];
    if (!axis || axis.length > 120) problems.push(`line ${line}: axis must be 1–120 characters`);
    if (!Number.isFinite(value) || value <= 0 || rawValue === '') problems.push(`line ${line}: value "${rawValue.slice(0, 40)}" must be a positive number`);
    if (!unit) problems.push(`line ${line}: unit "${rawUnit.slice(0, 20)}" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)`);
    if (!method || method.length > 200) problems.push(`line ${line}: method must be 1–200 characters (e.g. compound pendulum)`);
    if (unit && Number.isFinite(value) && value > 0 && axis && method) {
      rows.push({ line, axis: axis.slice(0, 120), value: fromDisplay(value, 'inertia', unit), enteredValue: value, enteredUnit: unit, method: method.slice(0, 200) });
    }
  });
  return problems.length ? { ok: false, problems } : { ok: true, rows };
}
