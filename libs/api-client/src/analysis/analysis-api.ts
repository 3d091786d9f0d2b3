import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { SpinReport } from '@tumblewise/engine';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** Analysis without saving (`POST /analyze`, not workspace-scoped). */
@Injectable({ providedIn: 'root' })
export class AnalysisApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /**
   * The spin report of a part document; nothing is saved. With `workspaceId` the server resolves
   * the document's `materialId`s and `meshId`s in that workspace (the caller must be a member).
   * 400 names the field at fault, 422 (`unanalysable`) a part the engine cannot analyse.
   */
  analyze(document: unknown, workspaceId?: string): Observable<SpinReport> {
    const params: Record<string, string> = workspaceId ? { workspace: workspaceId } : {};
    return this.http.post<SpinReport>(`${this.base}/analyze`, document, { params });
  }
}
