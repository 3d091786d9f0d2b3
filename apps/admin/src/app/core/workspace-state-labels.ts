import type { Workspace } from '@tumblewise/shared';

/** How each workspace state is written on screen. */
export const WORKSPACE_STATE_LABELS: Record<Workspace['state'], string> = {
  active: 'Active',
  past_due: 'Past due',
  read_only: 'Read-only',
  suspended: 'Suspended',
};

/** The label of a state; unknown states show their raw name. */
export function workspaceStateLabel(state: string): string {
  return (WORKSPACE_STATE_LABELS as Record<string, string>)[state] ?? state;
}
