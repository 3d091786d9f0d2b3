import type { Body } from '../composition/body';
import type { PrincipalAxes } from '../principal/principal-axes';
import type { SpinAssessment } from '../spin/assess-spin';
import type { TradeFigures } from '../trade/trade-figures';

/** The outcome of one category check. Every check is indicative: only the governing body's own test decides conformance. */
export interface CategoryCheck {
  /** Stable id, e.g. `golf-wood.moment`. */
  id: string;
  /** What is checked, in plain words. */
  title: string;
  /** The rule or standard the limit comes from (with "value from memory" where it was not re-checked against the text). */
  rule: string;
  /** The figure in SI (m, kg, kg·m², m³), or null when it cannot be evaluated. */
  value: number | null;
  /** SI unit of value and limits. */
  unit: string;
  /** Allowed range in SI, including any stated test tolerance. */
  limit: { min?: number; max?: number };
  status: 'pass' | 'fail' | 'info' | 'not-evaluated';
  indicative: true;
  note?: string;
}

/** What the category checks read. */
export interface CheckContext {
  body: Body;
  principal: PrincipalAxes;
  spin: SpinAssessment;
  /** Null when the part has no grip frame. */
  trade: TradeFigures | null;
  grip: { point: ArrayLike<number>; axis: ArrayLike<number>; faceNormal: ArrayLike<number> } | null;
  /** Extent of the material along a unit direction in part axes (m). */
  extent(u: ArrayLike<number>): number;
  /** Reach of the material along a unit direction from the part origin (m). */
  reach(u: ArrayLike<number>): number;
  division: 'men' | 'women';
}

/** Relative slack at a limit so rounding (0.7 + 0.1 < 0.8) does not fail a part that sits exactly on it. */
const LIMIT_SLACK = 1e-9;

/** A range check: pass inside [min, max] (within LIMIT_SLACK), fail outside, not-evaluated without a value. */
export function rangeCheck(
  base: Omit<CategoryCheck, 'status' | 'indicative' | 'value' | 'limit'>,
  value: number | null,
  limit: { min?: number; max?: number },
  missing = 'needs a grip frame (grip.point, grip.axis, grip.faceNormal)',
): CategoryCheck {
  if (value === null || !Number.isFinite(value))
    return { ...base, value: null, limit, status: 'not-evaluated', indicative: true, note: missing };
  const ok =
    (limit.min === undefined || value >= limit.min * (1 - LIMIT_SLACK)) &&
    (limit.max === undefined || value <= limit.max * (1 + LIMIT_SLACK));
  return { ...base, value, limit, status: ok ? 'pass' : 'fail', indicative: true };
}

/** An informational figure with no limit. */
export function infoCheck(base: Omit<CategoryCheck, 'status' | 'indicative' | 'value' | 'limit'>, value: number | null): CategoryCheck {
  return {
    ...base,
    value: value !== null && Number.isFinite(value) ? value : null,
    limit: {},
    status: value === null ? 'not-evaluated' : 'info',
    indicative: true,
  };
}
