import type { SpinReport } from '../engine/report/spin-report';

/**
 * Side-by-side figures of 2–6 variants with deltas against a chosen baseline. Pure and shared:
 * the compare screen and the CSV export build the same table. Values in SI units.
 */
export interface ComparedVariant {
  id: string;
  label: string;
  /** The stored spin report (untrusted shape: missing figures become null). */
  report: unknown;
}

export interface ComparisonRow {
  key: string;
  label: string;
  /** SI unit, '' for a ratio, 'text' for a word. */
  unit: string;
  values: (number | string | null)[];
  /** value − baseline value, for numeric rows; null elsewhere. */
  deltas: (number | null)[];
  /** delta / |baseline|, for numeric rows with a non-zero baseline. */
  relativeDeltas: (number | null)[];
}

export interface Comparison {
  variants: { id: string; label: string }[];
  baselineIndex: number;
  rows: ComparisonRow[];
}

/** A stored report as read back: any engine version may have written it, so every field may be missing. */
type DeepPartial<T> = T extends object ? { [K in keyof T]?: DeepPartial<T[K]> | null } : T;
type StoredReport = DeepPartial<SpinReport>;
type Getter = (r: StoredReport) => unknown;
const ROWS: { key: string; label: string; unit: string; get: Getter }[] = [
  { key: 'verdict', label: 'Verdict', unit: 'text', get: (r) => r.spin?.verdict },
  { key: 'nearestAxis', label: 'Nearest principal axis', unit: 'text', get: (r) => r.spin?.nearestAxis },
  // Reports stored before the motion axis and the flight time were computed lack these: they show as missing.
  { key: 'motionAxis', label: 'Axis the motion circles', unit: 'text', get: (r) => r.spin?.motionAxis },
  { key: 'mass', label: 'Mass', unit: 'kg', get: (r) => r.mass },
  { key: 'I1', label: 'Principal moment I1 (major)', unit: 'kg·m²', get: (r) => r.principal?.moments?.[0] },
  { key: 'I2', label: 'Principal moment I2 (intermediate)', unit: 'kg·m²', get: (r) => r.principal?.moments?.[1] },
  { key: 'I3', label: 'Principal moment I3 (minor)', unit: 'kg·m²', get: (r) => r.principal?.moments?.[2] },
  { key: 'marginMajor', label: 'Margin (I1−I2)/I2', unit: '', get: (r) => r.spin?.margins?.major },
  { key: 'marginMinor', label: 'Margin (I2−I3)/I2', unit: '', get: (r) => r.spin?.margins?.minor },
  { key: 'misalignment', label: 'Misalignment from nearest axis', unit: '°', get: (r) => r.spin?.misalignmentDeg },
  { key: 'growthRate', label: 'Growth rate λ', unit: '1/s', get: (r) => r.spin?.growthRate },
  { key: 'flipTime', label: 'Time to first flip', unit: 's', get: (r) => r.spin?.flipTime },
  { key: 'wobble', label: 'Wobble frequency', unit: 'rad/s', get: (r) => r.spin?.wobbleFrequency },
  { key: 'cone', label: 'Cone half-angle of the motion', unit: '°', get: (r) => r.spin?.coneHalfAngleDeg },
  { key: 'wobblePeriod', label: 'Period of the body-frame motion', unit: 's', get: (r) => r.spin?.wobblePeriod },
  { key: 'flightTime', label: 'Time in the air', unit: 's', get: (r) => r.spin?.flightTime },
  { key: 'balancePoint', label: 'Balance point from butt', unit: 'm', get: (r) => r.trade?.balancePoint },
  { key: 'swingweight', label: 'Swingweight (10 cm axis)', unit: 'kg·m²', get: (r) => r.trade?.swingweight },
  { key: 'recoilWeight', label: 'Recoil weight', unit: 'kg·m²', get: (r) => r.trade?.recoilWeight },
  { key: 'twistweight', label: 'Twistweight', unit: 'kg·m²', get: (r) => r.trade?.twistweight },
];

const numberOrNull = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Builds the comparison; `baselineId` defaults to the first variant. Throws on fewer than 2 or more than 6. */
export function buildComparison(variants: ComparedVariant[], baselineId?: string): Comparison {
  if (variants.length < 2 || variants.length > 6) throw new RangeError('compare 2 to 6 variants');
  const baselineIndex = baselineId ? variants.findIndex((v) => v.id === baselineId) : 0;
  if (baselineIndex < 0) throw new RangeError('the baseline must be one of the compared variants');
  const reports = variants.map((v) => (v.report && typeof v.report === 'object' ? (v.report as StoredReport) : {}));
  const rows = ROWS.map(({ key, label, unit, get }) => {
    if (unit === 'text') {
      const values = reports.map((r) => {
        const v = get(r);
        return typeof v === 'string' ? v : null;
      });
      return { key, label, unit, values, deltas: values.map(() => null), relativeDeltas: values.map(() => null) };
    }
    const values = reports.map((r) => numberOrNull(get(r)));
    const base = values[baselineIndex];
    const deltas = values.map((v) => (v !== null && base !== null ? v - base : null));
    const relativeDeltas = deltas.map((d) => (d !== null && base !== null && base !== 0 ? d / Math.abs(base) : null));
    return { key, label, unit, values, deltas, relativeDeltas };
  });
  return { variants: variants.map((v) => ({ id: v.id, label: v.label })), baselineIndex, rows };
}

const csvCell = (v: unknown) => {
  const s = v === null || v === undefined ? '' : String(v);
  // Quote when needed; neutralise spreadsheet formulas (a cell starting with = + - @).
  const safe = /^[=+\-@]/.test(s) && !/^-?\d/.test(s) ? `'${s}` : s;
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
};

/** The comparison as CSV: one row per figure, a value and a delta column per variant. */
export function comparisonCsv(c: Comparison): string {
  const header = [
    'figure',
    'unit',
    ...c.variants.flatMap((v, i) => [v.label, i === c.baselineIndex ? `${v.label} (baseline) delta` : `${v.label} delta`]),
  ];
  const lines = [header, ...c.rows.map((r) => [r.label, r.unit === 'text' ? '' : r.unit, ...r.values.flatMap((v, i) => [v, r.deltas[i]])])];
  return lines.map((l) => l.map(csvCell).join(',')).join('\r\n') + '\r\n';
}
