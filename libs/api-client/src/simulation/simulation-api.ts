import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { SimulationResult } from '@tumblewise/engine';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** Body of `POST /simulate` for a part document (SI; misalignment in degrees). */
export interface SimulateBody {
  part: unknown;
  misalignmentDeg?: number;
  seconds: number;
  sampleRate: number;
}

/** Torque-free motion of a part, computed on the server (nothing saved). */
@Injectable({ providedIn: 'root' })
export class SimulationApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /**
   * Samples ω, attitude, angular momentum and polhode from the part's intended spin plus a
   * misalignment; `workspaceId` resolves the document's materialId and meshId references there.
   */
  simulate(body: SimulateBody, workspaceId?: string | null): Observable<SimulationResult> {
    return this.http.post<SimulationResult>(`${this.base}/simulate`, body, workspaceId ? { params: { workspace: workspaceId } } : {});
  }
}
