import { computed, Injectable, signal } from '@angular/core';
import type { Membership, Session, User } from '@tumblewise/shared';

/**
 * The signed-in session, held in memory only. The access token never touches storage; the
 * refresh token is an httpOnly cookie the browser keeps.
 */
@Injectable({ providedIn: 'root' })
export class AuthState {
  private readonly sessionValue = signal<Session | null>(null);
  private readonly restoredValue = signal(false);

  /** The current session, or null when signed out. */
  readonly session = this.sessionValue.asReadonly();
  /** True once the start-up session restore has answered (either way). */
  readonly restored = this.restoredValue.asReadonly();
  /** Bearer token for API calls, or null. */
  readonly accessToken = computed(() => this.sessionValue()?.accessToken ?? null);
  /** The signed-in user, or null. */
  readonly user = computed<User | null>(() => this.sessionValue()?.user ?? null);
  /** The user's workspaces and roles (empty when signed out). */
  readonly memberships = computed<Membership[]>(() => this.sessionValue()?.memberships ?? []);
  /** True while a session is held. */
  readonly signedIn = computed(() => this.sessionValue() !== null);

  /** Stores a session answered by sign-up, sign-in, refresh or invitation acceptance. */
  setSession(session: Session): void {
    this.sessionValue.set(session);
  }

  /** Replaces the memberships (after `GET /me` or a change made elsewhere). */
  updateMemberships(memberships: Membership[]): void {
    const current = this.sessionValue();
    if (current) this.sessionValue.set({ ...current, memberships });
  }

  /** Forgets the session (sign-out, or a refresh that failed). */
  clear(): void {
    this.sessionValue.set(null);
  }

  /** Records that the start-up restore has finished. */
  markRestored(): void {
    this.restoredValue.set(true);
  }
}
