import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, throwError } from 'rxjs';
import { API_BASE_URL, isApiUrl } from '../api-base-url';
import { ApiError } from './api-error';

/** Maps every failed API response to an {@link ApiError} so screens handle one error type. */
export const errorInterceptor: HttpInterceptorFn = (req, next) => {
  if (!isApiUrl(req.url, inject(API_BASE_URL))) return next(req);
  return next(req).pipe(
    catchError((error: unknown) => throwError(() => (error instanceof HttpErrorResponse ? ApiError.fromHttpError(error) : error))),
  );
};
