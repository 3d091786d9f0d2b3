import { HttpInterceptorFn, HttpRequest } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, switchMap, throwError } from 'rxjs';
import { API_BASE_URL, isApiUrl } from '../api-base-url';
import { statusOf } from '../errors/api-error';
import { AuthApi } from './auth-api';
import { AuthState } from './auth-state';
import { SKIP_REFRESH } from './skip-refresh';

/**
 * Attaches the bearer token to API calls. When a call that carried a token answers 401, refreshes
 * the session once and retries the call once with the new token; if the refresh fails, the
 * original 401 reaches the caller and the session is cleared.
 */
export const authInterceptor: HttpInterceptorFn = (req, next) => {
  if (!isApiUrl(req.url, inject(API_BASE_URL))) return next(req);
  const state = inject(AuthState);
  const authApi = inject(AuthApi);
  const token = state.accessToken();
  const skipRefresh = req.context.get(SKIP_REFRESH);

  return next(withBearer(req, token)).pipe(
    catchError((error: unknown) => {
      if (statusOf(error) !== 401 || skipRefresh || !token) return throwError(() => error);
      return authApi.refresh().pipe(
        catchError(() => throwError(() => error)),
        switchMap((session) => next(withBearer(req, session.accessToken))),
      );
    }),
  );
};

function withBearer(req: HttpRequest<unknown>, token: string | null): HttpRequest<unknown> {
  if (!token) return req;
  return req.clone({ setHeaders: { Authorization: `Bearer ${token}` } });
}
