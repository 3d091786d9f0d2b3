import { computed, inject, Injectable, signal } from '@angular/core';
import { can, type Membership, type Permission, type Role, type Workspace } from '@tumblewise/shared';
import { AuthState } from '../auth/auth-state';

const STORAGE_KEY = 'tumblewise.workspace';

/**
 * Which of the user's workspaces the apps are working in, and the user's role there. The choice
 * is remembered in local storage (an id, not a secret) so both apps open the same workspace.
 */
@Injectable({ providedIn: 'root' })
export class WorkspaceContext {
  private readonly auth = inject(AuthState);
  private readonly chosenId = signal<string | null>(readStoredId());

  /** All memberships of the signed-in user. */
  readonly memberships = this.auth.memberships;
  /** The current membership: the chosen one if still held, else the first. */
  readonly membership = computed<Membership | null>(() => {
    const memberships = this.auth.memberships();
    const chosen = this.chosenId();
    return memberships.find((m) => m.workspace.id === chosen) ?? memberships[0] ?? null;
  });
  /** The current workspace, or null when signed out or without memberships. */
  readonly workspace = computed<Workspace | null>(() => this.membership()?.workspace ?? null);
  /** Id of the current workspace, or null. */
  readonly workspaceId = computed<string | null>(() => this.workspace()?.id ?? null);
  /** The user's role in the current workspace, or null. */
  readonly role = computed<Role | null>(() => this.membership()?.role ?? null);
  /** True when the user belongs to more than one workspace (the switcher is shown). */
  readonly hasSeveral = computed(() => this.auth.memberships().length > 1);

  /** Makes `workspaceId` the current workspace. */
  select(workspaceId: string): void {
    this.chosenId.set(workspaceId);
    try {
      localStorage.setItem(STORAGE_KEY, workspaceId);
    } catch {
      // Storage may be disabled; the choice then lasts for this page only.
    }
  }

  /** True when the current role grants `permission`. */
  can(permission: Permission): boolean {
    return can(this.role(), permission);
  }
}

function readStoredId(): string | null {
  try {
    return localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}
