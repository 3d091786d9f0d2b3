import type { AuditQuery } from '@tumblewise/shared';

/** The filter fields of the audit page as the form holds them (dates as yyyy-mm-dd). */
export interface AuditFilterValue {
  action: string;
  actor: string;
  from: string;
  to: string;
}

/**
 * Turns the form's filter into the API query: empty fields are left out, `from` is the start
 * of that local day and `to` the end of that local day, as ISO date-times.
 */
export function toAuditQuery(value: AuditFilterValue, page: number, pageSize: number): Partial<AuditQuery> {
  const query: Partial<AuditQuery> = { page, pageSize };
  if (value.action) query.action = value.action;
  if (value.actor) query.actor = value.actor;
  if (value.from) query.from = localDayBoundary(value.from, 'start');
  if (value.to) query.to = localDayBoundary(value.to, 'end');
  return query;
}

/** True when both dates are set and `to` is before `from`. */
export function rangeIsReversed(value: Pick<AuditFilterValue, 'from' | 'to'>): boolean {
  return !!value.from && !!value.to && value.to < value.from;
}

function localDayBoundary(day: string, edge: 'start' | 'end'): string | undefined {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!match) return undefined;
  const [, y, m, d] = match.map(Number);
  const date = edge === 'start' ? new Date(y, m - 1, d, 0, 0, 0, 0) : new Date(y, m - 1, d, 23, 59, 59, 999);
  return Number.isNaN(date.getTime()) ? undefined : date.toISOString();
}
