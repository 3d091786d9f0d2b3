import { HttpClient, HttpEventType, type HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Measurement } from '@tumblewise/shared';
import { filter, map, Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';
import type { ApiError } from '../errors/api-error';

/** One step of an upload: bytes on their way (fraction 0…1, null when the size is unknown), then the imported rows. */
export type MeasurementUpload =
  | { kind: 'progress'; fraction: number | null }
  | { kind: 'done'; rows: Measurement[] };

/** One problem the server found in a refused CSV: the line it is on (null for the file as a whole) and what is wrong. */
export interface CsvProblem {
  line: number | null;
  message: string;
}

const REFUSED_PREFIX = /^The CSV was not imported:\s*/;

/**
 * The problems of a refused measured-data CSV, read from the server's message (`The CSV was not
 * imported: line 3: …; line 4: ….`). Problems are separated by "; " and those about one line start
 * with "line N:". Empty when the error is not such a refusal (then show its message as it is).
 */
export function csvProblemsOf(error: Pick<ApiError, 'status' | 'field' | 'message'>): CsvProblem[] {
  if (error.status !== 400 || error.field !== 'file' || !REFUSED_PREFIX.test(error.message)) return [];
  let body = error.message.replace(REFUSED_PREFIX, '').replace(/\.\s*$/, '');
  // The server lists the first 20 problems and counts the rest: "… (and 7 more)".
  const rest = /\s*\(and (\d+) more\)$/.exec(body);
  if (rest) body = body.slice(0, rest.index);
  const problems: CsvProblem[] = body
    .split(/;\s+(?=line \d+:)/)
    .map((part) => part.trim())
    .filter(Boolean)
    .map((part) => {
      const m = /^line (\d+):\s*(.*)$/s.exec(part);
      return m ? { line: Number(m[1]), message: m[2] } : { line: null, message: part };
    });
  if (rest) problems.push({ line: null, message: `${rest[1]} more problem${rest[1] === '1' ? '' : 's'} not listed` });
  return problems;
}

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
   * progress, then the imported rows. A bad row refuses the whole file: 400 with field `file`, whose
   * problems {@link csvProblemsOf} lists by line; nothing is imported then.
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

  private url(workspaceId: string, variantId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/variants/${encodeURIComponent(variantId)}/measurements`;
  }
}
