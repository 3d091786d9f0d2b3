import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { OperatorWorkspace } from '@tumblewise/shared';
import { catchError, Observable, throwError } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';
import { statusOf } from '../errors/api-error';

/** The list query of the operator's workspace table; empty values are left out. */
export interface OperatorWorkspacesQuery {
  q?: string;
  state?: OperatorWorkspace['state'];
  sort?: 'name' | 'createdAt' | 'members' | 'seats' | 'lastActivityAt';
  order?: 'asc' | 'desc';
}

/** The platform's health answer: service states (flat or under `services`), an overall status when given, and other figures. */
export interface PlatformHealth {
  status?: string;
  checkedAt?: string;
  [key: string]: unknown;
}

/** Operator calls (`/operator/…`): every workspace, suspension, platform health. Others get 403. */
@Injectable({ providedIn: 'root' })
export class OperatorApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** All workspaces of the platform, filtered and sorted on the server. */
  workspaces(query: OperatorWorkspacesQuery): Observable<OperatorWorkspace[]> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) {
      if (value !== undefined && value !== null && value !== '') params = params.set(key, String(value));
    }
    return this.http.get<OperatorWorkspace[]>(`${this.base}/operator/workspaces`, { params });
  }

  /** Suspends a workspace: its members can sign in and read, not edit. */
  suspend(workspaceId: string, reason: string): Observable<OperatorWorkspace> {
    return this.http.post<OperatorWorkspace>(`${this.base}/operator/workspaces/${encodeURIComponent(workspaceId)}/suspend`, { reason });
  }

  /** Lifts a suspension. */
  restore(workspaceId: string, reason: string): Observable<OperatorWorkspace> {
    return this.http.post<OperatorWorkspace>(`${this.base}/operator/workspaces/${encodeURIComponent(workspaceId)}/restore`, { reason });
  }

  /** Platform health; falls back to the public `/health` while the operator route is missing. */
  health(): Observable<PlatformHealth> {
    return this.http
      .get<PlatformHealth>(`${this.base}/operator/health`)
      .pipe(
        catchError((error: unknown) =>
          statusOf(error) === 404 ? this.http.get<PlatformHealth>(`${this.base}/health`) : throwError(() => error),
        ),
      );
  }
}
