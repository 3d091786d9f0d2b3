import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { AuditEvent, AuditQuery, Page } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** The workspace's audit trail, paged on the server. */
@Injectable({ providedIn: 'root' })
export class AuditApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** One page of audit events, newest first, filtered by action, actor and time range. */
  list(workspaceId: string, query: Partial<AuditQuery>): Observable<Page<AuditEvent>> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) {
      if (value !== undefined && value !== null && value !== '') params = params.set(key, String(value));
    }
    return this.http.get<Page<AuditEvent>>(`${this.base}/workspaces/${encodeURIComponent(workspaceId)}/audit`, { params });
  }
}
