import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Member, Role } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** Members of a workspace (`/workspaces/:id/members`). */
@Injectable({ providedIn: 'root' })
export class MembersApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Lists the workspace's members. */
  list(workspaceId: string): Observable<Member[]> {
    return this.http.get<Member[]>(this.url(workspaceId));
  }

  /** Gives a member another role; 409 `last_owner` when it would leave no owner. */
  changeRole(workspaceId: string, memberId: string, role: Role): Observable<Member> {
    return this.http.patch<Member>(`${this.url(workspaceId)}/${encodeURIComponent(memberId)}`, { role });
  }

  /** Removes a member; 409 `last_owner` for the last owner. */
  remove(workspaceId: string, memberId: string): Observable<void> {
    return this.http.delete<void>(`${this.url(workspaceId)}/${encodeURIComponent(memberId)}`);
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/members`;
  }
}
