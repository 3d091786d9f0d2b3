import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { SolveAnswer, SolveRequest, SweepAnswer, SweepRequest } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** Design to target without saving (`POST /solve`, `POST /sweep`; not workspace-scoped). */
@Injectable({ providedIn: 'root' })
export class DesignApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /**
   * Goal seek: the free parameters changed within their bounds so the part meets the targets (SI).
   * With `workspaceId` the server resolves stored materials and meshes there. 400 names the field.
   */
  solve(request: SolveRequest, workspaceId?: string): Observable<SolveAnswer> {
    return this.http.post<SolveAnswer>(`${this.base}/solve`, request, { params: workspaceId ? { workspace: workspaceId } : {} });
  }

  /** The verdict and figures over a grid of one or two parameters, first axis slowest. */
  sweep(request: SweepRequest, workspaceId?: string): Observable<SweepAnswer> {
    return this.http.post<SweepAnswer>(`${this.base}/sweep`, request, { params: workspaceId ? { workspace: workspaceId } : {} });
  }
}
