import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Me, PasswordResetBody, PasswordResetConfirmBody, Session, SigninBody, SignupBody } from '@tumblewise/shared';
import { finalize, Observable, shareReplay, tap } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';
import { statusOf } from '../errors/api-error';
import { WorkspaceContext } from '../workspace/workspace-context';
import { AuthState } from './auth-state';
import { skipRefreshContext } from './skip-refresh';

/** A plain `{ message }` answer. */
export interface MessageResponse {
  message: string;
}

/** Account calls under `/auth` and `/me`; keeps {@link AuthState} in step with their answers. */
@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);
  private readonly state = inject(AuthState);
  private readonly workspace = inject(WorkspaceContext);
  private refreshInFlight: Observable<Session> | null = null;

  /** Creates a workspace and its owner, and signs the owner in. */
  signUp(body: SignupBody): Observable<Session> {
    return this.http
      .post<Session>(`${this.base}/auth/signup`, body, { context: skipRefreshContext() })
      .pipe(tap((session) => this.adopt(session)));
  }

  /** Signs in with e-mail and password. */
  signIn(body: SigninBody): Observable<Session> {
    return this.http
      .post<Session>(`${this.base}/auth/signin`, body, { context: skipRefreshContext() })
      .pipe(tap((session) => this.adopt(session)));
  }

  /**
   * Exchanges the refresh cookie for a new access token. Concurrent callers share one request.
   * A failure clears the session.
   */
  refresh(): Observable<Session> {
    if (!this.refreshInFlight) {
      this.refreshInFlight = this.http.post<Session>(`${this.base}/auth/refresh`, null, { context: skipRefreshContext() }).pipe(
        tap({
          next: (session) => this.adopt(session),
          error: () => this.state.clear(),
        }),
        finalize(() => (this.refreshInFlight = null)),
        shareReplay({ bufferSize: 1, refCount: false }),
      );
    }
    return this.refreshInFlight;
  }

  /** Restores the session at start-up; resolves either way (401 simply means signed out). */
  restoreSession(): Promise<void> {
    return new Promise<void>((resolve) => {
      this.refresh().subscribe({
        next: () => {
          this.state.markRestored();
          resolve();
        },
        error: (error: unknown) => {
          if (statusOf(error) !== 401) console.warn('Session restore failed', error);
          this.state.markRestored();
          resolve();
        },
      });
    });
  }

  /** Signs out on the server and forgets the session here whatever the answer. */
  signOut(): Observable<void> {
    return this.http
      .post<void>(`${this.base}/auth/signout`, null, { context: skipRefreshContext() })
      .pipe(finalize(() => this.state.clear()));
  }

  /** Asks for a password-reset e-mail; the answer is the same whether or not the address exists. */
  requestPasswordReset(body: PasswordResetBody): Observable<MessageResponse> {
    return this.http.post<MessageResponse>(`${this.base}/auth/password-reset`, body, { context: skipRefreshContext() });
  }

  /** Sets a new password with the token from the reset e-mail. */
  confirmPasswordReset(body: PasswordResetConfirmBody): Observable<MessageResponse> {
    return this.http.post<MessageResponse>(`${this.base}/auth/password-reset/confirm`, body, { context: skipRefreshContext() });
  }

  /** Reloads the user and memberships (`GET /me`). */
  loadMe(): Observable<Me> {
    return this.http.get<Me>(`${this.base}/me`).pipe(tap((me) => this.state.updateMemberships(me.memberships)));
  }

  /** Stores a session and, when it names a workspace just created or joined, makes that one current. */
  adopt(session: Session): void {
    this.state.setSession(session);
    if (session.workspace) this.workspace.select(session.workspace.id);
  }
}
