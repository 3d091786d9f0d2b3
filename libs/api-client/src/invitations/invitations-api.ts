import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { AcceptInvitationBody, CreateInvitationBody, Invitation, InvitationPreview, Session } from '@tumblewise/shared';
import { Observable, tap } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';
import { AuthApi } from '../auth/auth-api';
import { skipRefreshContext } from '../auth/skip-refresh';

/** Invitations: the workspace's list and the public preview / accept calls. */
@Injectable({ providedIn: 'root' })
export class InvitationsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);
  private readonly authApi = inject(AuthApi);

  /** Lists the workspace's invitations in every status. */
  list(workspaceId: string): Observable<Invitation[]> {
    return this.http.get<Invitation[]>(this.url(workspaceId));
  }

  /** Invites an address with a role; the answer says whether the e-mail went out. */
  create(workspaceId: string, body: CreateInvitationBody): Observable<Invitation> {
    return this.http.post<Invitation>(this.url(workspaceId), body);
  }

  /** Sends the invitation e-mail again (also after a failed delivery). */
  resend(workspaceId: string, invitationId: string): Observable<Invitation> {
    return this.http.post<Invitation>(`${this.url(workspaceId)}/${encodeURIComponent(invitationId)}/resend`, null);
  }

  /** Revokes a pending invitation; answers it with status `revoked`. */
  revoke(workspaceId: string, invitationId: string): Observable<Invitation> {
    return this.http.delete<Invitation>(`${this.url(workspaceId)}/${encodeURIComponent(invitationId)}`);
  }

  /** What an invitation link offers, before accepting (410 when expired or used). */
  preview(token: string): Observable<InvitationPreview> {
    return this.http.get<InvitationPreview>(`${this.base}/invitations/preview`, {
      params: new HttpParams().set('token', token),
      context: skipRefreshContext(),
    });
  }

  /**
   * Accepts an invitation. Signed in, the membership goes to the current user; otherwise `name`
   * and `password` create the account. The answer is a session in the joined workspace.
   */
  accept(body: AcceptInvitationBody): Observable<Session> {
    return this.http.post<Session>(`${this.base}/invitations/accept`, body).pipe(tap((session) => this.authApi.adopt(session)));
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/invitations`;
  }
}
