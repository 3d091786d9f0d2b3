import type { OperatorWorkspacesQuery } from '@tumblewise/api-client';
import type { OperatorWorkspace } from '@tumblewise/shared';

/** The filter fields above the operator's workspace table. */
export interface OperatorFilter {
  /** Text to find in the workspace name (the server searches). */
  q: string;
  /** '' for every state. */
  state: OperatorWorkspace['state'] | '';
}

/** The table's sort as the sort header reports it (`direction` '' when the user cleared it). */
export interface OperatorSort {
  active: string;
  direction: 'asc' | 'desc' | '';
}

/** Table columns the server can sort by, and the query's name for each. */
export const SORTABLE_COLUMNS: Readonly<Record<string, NonNullable<OperatorWorkspacesQuery['sort']>>> = {
  name: 'name',
  created: 'createdAt',
  seats: 'seats',
  members: 'members',
  lastActivity: 'lastActivityAt',
};

/**
 * Builds the list query of `GET /operator/workspaces`: the trimmed search text and the state when
 * set, and the sort with its order when a sortable column is sorted. Anything left out takes the
 * server's default (newest first).
 */
export function toOperatorQuery(filter: OperatorFilter, sort: OperatorSort | null): OperatorWorkspacesQuery {
  const query: OperatorWorkspacesQuery = {};
  const q = filter.q.trim().slice(0, 80);
  if (q) query.q = q;
  if (filter.state) query.state = filter.state;
  const column = sort && sort.direction ? SORTABLE_COLUMNS[sort.active] : undefined;
  if (column && sort?.direction) {
    query.sort = column;
    query.order = sort.direction;
  }
  return query;
}
