import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** One measured figure of a benchmark run. */
export interface BenchRow {
  name: string;
  value: number;
  unit: string;
  note?: string;
}

/** The figures of one benchmark group: printed as a table while measured, written as JSON at the end. */
export class BenchTable {
  readonly rows: BenchRow[] = [];

  record(name: string, value: number, unit: string, note?: string): void {
    this.rows.push({ name, value, unit, note });
    console.log(`${name.padEnd(58)} ${value.toPrecision(4).padStart(10)} ${unit.padEnd(8)} ${note ?? ''}`);
  }

  /** Writes `.data/bench/<name>.json` (git-ignored) and returns its path. */
  write(name: string, extra: Record<string, unknown> = {}): string {
    const out = join(process.cwd(), '.data', 'bench');
    mkdirSync(out, { recursive: true });
    const file = join(out, `${name}.json`);
    writeFileSync(file, JSON.stringify({ node: process.version, date: new Date().toISOString(), ...extra, rows: this.rows }, null, 2));
    console.log(`\nwritten ${file}`);
    return file;
  }
}
