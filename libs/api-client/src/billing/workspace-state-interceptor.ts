import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { tap } from 'rxjs';
import { ApiError } from '../errors/api-error';
import { WorkspaceStandings } from './workspace-standing';

const REFUSALS: Record<string, 'suspended' | 'read_only'> = { workspace_suspended: 'suspended', workspace_read_only: 'read_only' };

/**
 * A write refused because the workspace is suspended or read-only (403 `workspace_suspended` /
 * `workspace_read_only`) tells the state before `/me` does: note it, so the shell's banner shows
 * at once. The error itself goes on to the screen that made the call.
 */
export const workspaceStateInterceptor: HttpInterceptorFn = (req, next) => {
  const standings = inject(WorkspaceStandings);
  return next(req).pipe(
    tap({
      error: (error: unknown) => {
        const fault = error instanceof ApiError ? error : error instanceof HttpErrorResponse ? ApiError.fromHttpError(error) : null;
        const state = fault && fault.status === 403 ? REFUSALS[fault.code] : undefined;
        const workspaceId = /\/workspaces\/([^/?#]+)/.exec(req.url)?.[1];
        if (state && workspaceId) standings.note(decodeURIComponent(workspaceId), { state });
      },
    }),
  );
};
