import type { SpinReport } from '@tumblewise/engine';
import { toApiError, type ApiError } from '@tumblewise/api-client';
import { catchError, debounceTime, map, Observable, of, scan, startWith, switchMap, type SchedulerLike, asyncScheduler } from 'rxjs';
import { messageForField, type AnalysisRequest, type FieldIssues } from './document-issues';
import type { DraftDocument } from './draft-document';

/**
 * Quiet time after the last keystroke before the report is recomputed (ms). Short enough that
 * keystroke → updated report stays within 150 ms for a 50-primitive part (`npm run bench`), long
 * enough to merge a held key's auto-repeat (about 30 ms apart); a request fired between slower
 * keystrokes is cancelled by the next one (switchMap).
 */
export const ANALYSIS_DEBOUNCE_MS = 40;

/** What the live report panel shows. `report` is the newest report received, kept while the next one loads or fails. */
export interface LiveAnalysis {
  status: 'idle' | 'invalid' | 'loading' | 'ready' | 'error';
  report: SpinReport | null;
  /** The document `report` was computed from (for the spin rate the turn count uses). */
  analysed: DraftDocument | null;
  /** Problems found before sending (client schema) or named by the server, by JSON path. */
  issues: FieldIssues;
  /** The failure of the last request, when not tied to a field or in addition to it. */
  error: ApiError | null;
}

type Step = Omit<LiveAnalysis, 'report' | 'analysed'> & { report?: SpinReport; analysed?: DraftDocument };

/** Starting state: nothing analysed yet. */
export const IDLE_ANALYSIS: LiveAnalysis = { status: 'idle', report: null, analysed: null, issues: {}, error: null };

/**
 * The live spin report as a stream: each document waits `debounceMs` of quiet, is prepared
 * (materials resolved, checked with the shared schema; an invalid one is not sent) and analysed;
 * a newer document cancels the request in flight (switchMap), so a stale answer never shows.
 * Server errors naming a field are mapped to that field's JSON path.
 */
export function liveAnalysis(
  documents: Observable<DraftDocument>,
  prepare: (doc: DraftDocument) => AnalysisRequest,
  analyze: (doc: DraftDocument) => Observable<SpinReport>,
  debounceMs = ANALYSIS_DEBOUNCE_MS,
  scheduler: SchedulerLike = asyncScheduler,
): Observable<LiveAnalysis> {
  return documents.pipe(
    debounceTime(debounceMs, scheduler),
    switchMap((doc): Observable<Step> => {
      if (doc.primitives.length === 0) return of({ status: 'idle', issues: {}, error: null });
      const request = prepare(doc);
      if (!request.ok) return of({ status: 'invalid', issues: request.issues, error: null });
      return analyze(request.document).pipe(
        map((report): Step => ({ status: 'ready', report, analysed: doc, issues: {}, error: null })),
        catchError((failure: unknown) => {
          const error = toApiError(failure);
          const issues: FieldIssues = error.field ? { [error.field]: messageForField(error.message, error.field) } : {};
          return of<Step>({ status: 'error', issues, error });
        }),
        startWith<Step>({ status: 'loading', issues: {}, error: null }),
      );
    }),
    scan<Step, LiveAnalysis>(
      (previous, step) => ({
        status: step.status,
        report: step.report ?? (step.status === 'idle' ? null : previous.report),
        analysed: step.analysed ?? (step.status === 'idle' ? null : previous.analysed),
        issues: step.issues,
        error: step.error,
      }),
      IDLE_ANALYSIS,
    ),
  );
}
