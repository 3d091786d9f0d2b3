import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { ScatterStudy } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** Per primitive id: relative density scatter (0.05 = ±5 %) and absolute dimension scatter (m), one standard deviation each. */
export type ScatterTolerances = Record<string, { density?: number; size?: number }>;

/** What starting a study sends. */
export interface StartScatter {
  variantId: string;
  tolerances: ScatterTolerances;
  /** 10 to 20 000. */
  samples: number;
  /** For a reproducible run; the server draws one when absent. */
  seed?: number;
}

/** Scatter studies: Monte Carlo over manufacturing tolerances, run as background jobs (`/workspaces/:id/scatter`). */
@Injectable({ providedIn: 'root' })
export class ScatterApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Queues a study (answered 202 with the queued study). */
  start(workspaceId: string, body: StartScatter): Observable<ScatterStudy> {
    return this.http.post<ScatterStudy>(this.url(workspaceId), body);
  }

  /** A study's state, progress (0…1) and, when done, its result. */
  get(workspaceId: string, studyId: string): Observable<ScatterStudy> {
    return this.http.get<ScatterStudy>(`${this.url(workspaceId)}/${encodeURIComponent(studyId)}`);
  }

  /** Cancels a queued or running study; 409 `study_finished` when it already ended. */
  cancel(workspaceId: string, studyId: string): Observable<ScatterStudy> {
    return this.http.post<ScatterStudy>(`${this.url(workspaceId)}/${encodeURIComponent(studyId)}/cancel`, {});
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/scatter`;
  }
}
