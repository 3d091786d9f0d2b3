import type { Part } from '@tumblewise/shared';
import { toApiError, type ApiError } from '@tumblewise/api-client';
import { asyncScheduler, catchError, concatMap, debounceTime, map, Observable, of, type SchedulerLike } from 'rxjs';
import type { DraftDocument } from './draft-document';

/** Quiet time after the last edit before the draft is saved (ms). */
export const AUTOSAVE_DEBOUNCE_MS = 1500;

/** The outcome of one draft save. */
export type DraftSaveOutcome =
  | { kind: 'saved'; part: Part; document: DraftDocument }
  | { kind: 'conflict'; error: ApiError; document: DraftDocument }
  | { kind: 'failed'; error: ApiError; document: DraftDocument };

/**
 * Saves drafts after a pause in editing, one save at a time (concatMap, so each save carries the
 * draftVersion the previous one returned). A 409 `stale_version` is a conflict: someone else saved;
 * the caller stops saving and keeps the local document.
 */
export function autosaveDrafts(
  changes: Observable<DraftDocument>,
  save: (doc: DraftDocument) => Observable<Part>,
  debounceMs = AUTOSAVE_DEBOUNCE_MS,
  scheduler: SchedulerLike = asyncScheduler,
): Observable<DraftSaveOutcome> {
  return changes.pipe(
    debounceTime(debounceMs, scheduler),
    concatMap((document) =>
      save(document).pipe(
        map((part): DraftSaveOutcome => ({ kind: 'saved', part, document })),
        catchError((failure: unknown) => {
          const error = toApiError(failure);
          return of<DraftSaveOutcome>({ kind: error.status === 409 ? 'conflict' : 'failed', error, document });
        }),
      ),
    ),
  );
}
