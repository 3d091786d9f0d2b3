import { parse } from 'csv-parse/sync';
import { fromDisplay } from '@tumblewise/engine';
import { MEASUREMENT_CSV_COLUMNS, MEASUREMENT_UNITS, type ErrorProblem } from '@tumblewise/shared';

export interface MeasurementRow {
  line: number;
  axis: string;
  value: number;
  enteredValue: number;
  enteredUnit: string;
  method: string;
}

/** Reads a measured-data CSV; either every row is good, or the problems by line number. */
export function readMeasurementCsv(
  text: string,
  maxRows = 500,
): { ok: true; rows: MeasurementRow[] } | { ok: false; problems: ErrorProblem[] } {
  let records: string[][];
  let lines: number[];
  try {
    // `info` gives each record's line in the file, so skipped blank lines do not shift the numbers
    // (a quoted value spanning lines is numbered by the line it ends on).
    const read = parse(text, { bom: true, skip_empty_lines: true, trim: true, relax_column_count: true, info: true }) as unknown as {
      record: string[];
      info: { lines: number };
    }[];
    records = read.map((r) => r.record);
    lines = read.map((r) => r.info.lines);
  } catch (err) {
    return { ok: false, problems: [{ line: null, message: `the file is not valid CSV (${(err as Error).message.slice(0, 160)})` }] };
  }
  if (records.length === 0)
    return {
      ok: false,
      problems: [{ line: null, message: 'the file is empty: give a header row axis,value,unit,method and one row per measurement' }],
    };
  const header = records[0].map((h) => h.toLowerCase());
  if (MEASUREMENT_CSV_COLUMNS.some((c, i) => header[i] !== c)) {
    return {
      ok: false,
      problems: [
        {
          line: lines[0],
          message: `the header must be ${MEASUREMENT_CSV_COLUMNS.join(',')} (found ${records[0].join(',').slice(0, 120)})`,
        },
      ],
    };
  }
  if (records.length === 1) return { ok: false, problems: [{ line: null, message: 'the file has a header but no measurements' }] };
  if (records.length - 1 > maxRows)
    return { ok: false, problems: [{ line: null, message: `the file has ${records.length - 1} rows; at most ${maxRows} are accepted` }] };
  const problems: ErrorProblem[] = [];
  const at = (line: number, message: string) => problems.push({ line, message });
  const rows: MeasurementRow[] = [];
  records.slice(1).forEach((r, i) => {
    const line = lines[i + 1];
    if (r.length !== 4) {
      at(line, `expected 4 columns, found ${r.length}`);
      return;
    }
    const [axis, rawValue, rawUnit, method] = r;
    const value = Number(rawValue.replace(',', '.'));
    const unit = MEASUREMENT_UNITS[rawUnit] ?? MEASUREMENT_UNITS[rawUnit.toLowerCase()];
    if (!axis || axis.length > 120) at(line, `axis must be 1–120 characters`);
    if (!Number.isFinite(value) || value <= 0 || rawValue === '') at(line, `value "${rawValue.slice(0, 40)}" must be a positive number`);
    if (!unit) at(line, `unit "${rawUnit.slice(0, 20)}" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)`);
    if (!method || method.length > 200) at(line, `method must be 1–200 characters (e.g. compound pendulum)`);
    if (unit && Number.isFinite(value) && value > 0 && axis && method) {
      rows.push({
        line,
        axis: axis.slice(0, 120),
        value: fromDisplay(value, 'inertia', unit),
        enteredValue: value,
        enteredUnit: unit,
        method: method.slice(0, 200),
      });
    }
  });
  return problems.length ? { ok: false, problems } : { ok: true, rows };
}
