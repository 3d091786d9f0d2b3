import { HttpClient, HttpEventType, type HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Measurement, MeasurementsRemoved } from '@tumblewise/shared';
import { filter, map, Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** One step of an upload: bytes on their way (fraction 0…1, null when the size is unknown), then the imported rows. */
export type MeasurementUpload = { kind: 'progress'; fraction: number | null } | { kind: 'done'; rows: Measurement[] };

/** Measured moments of a variant's prototype (pendulum rig) against its prediction (`/workspaces/:id/variants/:id/measurements`). */
@Injectable({ providedIn: 'root' })
export class MeasurementsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** The variant's measurements, oldest first, each with the predicted moment and the difference in per cent (null when the axis names no figure). */
  list(workspaceId: string, variantId: string): Observable<Measurement[]> {
    return this.http.get<Measurement[]>(this.url(workspaceId, variantId));
  }

  /**
   * Sends a CSV (header `axis,value,unit,method`) as the multipart field `file`, reporting upload
   * progress, then the imported rows (they share one `importId`). A bad row refuses the whole file:
   * 400 with field `file` and the problems by line in the ApiError's `problems`; nothing is imported then.
   */
  upload(workspaceId: string, variantId: string, file: Blob, filename = 'measurements.csv'): Observable<MeasurementUpload> {
    const form = new FormData();
    form.append('file', file, filename);
    return this.http.post<Measurement[]>(this.url(workspaceId, variantId), form, { observe: 'events', reportProgress: true }).pipe(
      filter((e: HttpEvent<Measurement[]>) => e.type === HttpEventType.UploadProgress || e.type === HttpEventType.Response),
      map((e): MeasurementUpload => {
        if (e.type === HttpEventType.Response) return { kind: 'done', rows: e.body ?? [] };
        const p = e as { loaded: number; total?: number };
        return { kind: 'progress', fraction: p.total ? Math.min(1, p.loaded / p.total) : null };
      }),
    );
  }

  /** Removes one measured row. */
  remove(workspaceId: string, variantId: string, measurementId: string): Observable<MeasurementsRemoved> {
    return this.http.delete<MeasurementsRemoved>(`${this.url(workspaceId, variantId)}/${encodeURIComponent(measurementId)}`);
  }

  /** Removes every row still left of one CSV import (undoing it); answers how many went. */
  removeImport(workspaceId: string, variantId: string, importId: string): Observable<MeasurementsRemoved> {
    return this.http.delete<MeasurementsRemoved>(`${this.url(workspaceId, variantId)}/imports/${encodeURIComponent(importId)}`);
  }

  private url(workspaceId: string, variantId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/variants/${encodeURIComponent(variantId)}/measurements`;
  }
}
