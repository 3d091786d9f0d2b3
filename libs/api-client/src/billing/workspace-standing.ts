import { computed, inject, Injectable, signal } from '@angular/core';
import type { Billing, Workspace } from '@tumblewise/shared';
import { WorkspaceContext } from '../workspace/workspace-context';

/** Where a workspace stands with the platform: its state and the details its banner names. */
export interface WorkspaceStanding {
  /** `active`, `past_due`, `read_only` or `suspended`. */
  state: Workspace['state'];
  /** When a past-due workspace becomes read-only (ISO), when known. */
  readOnlyFrom?: string | null;
  /** Why the platform suspended the workspace, when known. */
  suspendedReason?: string | null;
}

/** What an answer may tell about the workspace's standing (a membership's workspace or a billing answer). */
type StandingFields = Partial<WorkspaceStanding>;

/**
 * The current workspace's standing. It starts from the membership's workspace (`/me`, sign-in)
 * and is brought up to date by every billing answer and every write refused because of the state.
 */
@Injectable({ providedIn: 'root' })
export class WorkspaceStandings {
  private readonly workspace = inject(WorkspaceContext);
  private readonly known = signal<Record<string, WorkspaceStanding>>({});

  /** The current workspace's standing, or null without a workspace. */
  readonly current = computed<WorkspaceStanding | null>(() => {
    const workspace = this.workspace.workspace() as (Workspace & StandingFields) | null;
    if (!workspace) return null;
    const fromMembership: WorkspaceStanding = {
      state: workspace.state,
      readOnlyFrom: workspace.readOnlyFrom ?? null,
      suspendedReason: workspace.suspendedReason ?? null,
    };
    const learnt = this.known()[workspace.id];
    return learnt
      ? {
          ...fromMembership,
          ...learnt,
          readOnlyFrom: learnt.readOnlyFrom ?? fromMembership.readOnlyFrom,
          suspendedReason: learnt.suspendedReason ?? fromMembership.suspendedReason,
        }
      : fromMembership;
  });

  /** Records the state a billing answer gives for `workspaceId`. */
  noteBilling(workspaceId: string, billing: Pick<Billing, 'workspaceState' | 'readOnlyFrom'> & StandingFields): void {
    this.note(workspaceId, {
      state: billing.workspaceState,
      readOnlyFrom: billing.readOnlyFrom,
      suspendedReason: billing.suspendedReason ?? null,
    });
  }

  /** Records what is now known about `workspaceId`'s standing. */
  note(workspaceId: string, standing: WorkspaceStanding): void {
    this.known.update((all) => ({ ...all, [workspaceId]: standing }));
  }
}
