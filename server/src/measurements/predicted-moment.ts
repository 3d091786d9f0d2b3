import type { SpinReport } from '@tumblewise/engine';

/**
 * The predicted moment (kg·m²) a measured axis corresponds to: a principal role (major,
 * intermediate, minor) or a trade axis (swing = swingweight, twist = twistweight, pivot). Null when
 * the axis description names none of them or the report lacks the figure.
 */
export function predictedMoment(report: unknown, axis: string): number | null {
  const r = report as Partial<SpinReport> | null;
  const word = axis.trim().toLowerCase();
  const pick = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  if (/^(major|i1)\b/.test(word)) return pick(r?.principal?.moments?.[0]);
  if (/^(intermediate|i2)\b/.test(word)) return pick(r?.principal?.moments?.[1]);
  if (/^(minor|i3)\b/.test(word)) return pick(r?.principal?.moments?.[2]);
  if (/^swing/.test(word)) return pick(r?.trade?.swingweight);
  if (/^twist/.test(word)) return pick(r?.trade?.twistweight);
  if (/^pivot/.test(word)) return pick(r?.trade?.pivot?.moment);
  return null;
}
