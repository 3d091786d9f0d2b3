import { HttpErrorResponse } from '@angular/common/http';
import { isErrorBody, type ErrorProblem } from '@tumblewise/shared';

/** A failed API call, as every screen sees it: status, machine code, readable message, and the field at fault. */
export class ApiError extends Error {
  constructor(
    /** HTTP status; 0 when the server could not be reached. */
    readonly status: number,
    /** Machine-readable code from the error body (`invalid_credentials`, `last_owner`, ...). */
    readonly code: string,
    message: string,
    /** Body or query key the error is about, when the server named one. */
    readonly field?: string,
    /** Seconds to wait before trying again (429 responses). */
    readonly retryAfterSeconds?: number,
    /** Every problem the server found in an uploaded file, by line (null: the file as a whole); empty for other errors. */
    readonly problems: readonly ErrorProblem[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** Builds an ApiError from an HttpClient failure, reading the `{ error: { code, message, field, problems } }` body. */
  static fromHttpError(response: HttpErrorResponse): ApiError {
    if (response.status === 0) {
      return new ApiError(0, 'network', 'The server could not be reached. Check your connection and try again.');
    }
    const retryAfterSeconds = parseRetryAfter(response.headers?.get('Retry-After'));
    if (isErrorBody(response.error)) {
      const { code, message, field, problems } = response.error.error;
      return new ApiError(
        response.status,
        code,
        withRetryHint(message, response.status, retryAfterSeconds),
        field,
        retryAfterSeconds,
        problems ?? [],
      );
    }
    return new ApiError(
      response.status,
      fallbackCode(response.status),
      withRetryHint(fallbackMessage(response.status), response.status, retryAfterSeconds),
      undefined,
      retryAfterSeconds,
    );
  }
}

/** Turns anything a stream threw into an ApiError (an ApiError passes through unchanged). */
export function toApiError(error: unknown): ApiError {
  if (error instanceof ApiError) return error;
  if (error instanceof HttpErrorResponse) return ApiError.fromHttpError(error);
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return new ApiError(0, 'client_error', message);
}

/** HTTP status of an error that may or may not have been mapped yet. */
export function statusOf(error: unknown): number | null {
  if (error instanceof ApiError || error instanceof HttpErrorResponse) return error.status;
  return null;
}

function parseRetryAfter(value: string | null | undefined): number | undefined {
  if (!value) return undefined;
  const seconds = Number(value);
  if (Number.isFinite(seconds) && seconds >= 0) return Math.ceil(seconds);
  const date = Date.parse(value);
  if (Number.isNaN(date)) return undefined;
  return Math.max(0, Math.ceil((date - Date.now()) / 1000));
}

function withRetryHint(message: string, status: number, retryAfterSeconds: number | undefined): string {
  if (status !== 429 || retryAfterSeconds === undefined) return message;
  return `${message} Try again in ${retryAfterSeconds} s.`;
}

function fallbackCode(status: number): string {
  switch (status) {
    case 400:
      return 'bad_request';
    case 401:
      return 'unauthorized';
    case 403:
      return 'forbidden';
    case 404:
      return 'not_found';
    case 409:
      return 'conflict';
    case 410:
      return 'gone';
    case 429:
      return 'too_many_requests';
    default:
      return status >= 500 ? 'server_error' : 'http_error';
  }
}

function fallbackMessage(status: number): string {
  switch (status) {
    case 400:
      return 'The request was not accepted.';
    case 401:
      return 'Please sign in again.';
    case 403:
      return 'Your role does not allow this.';
    case 404:
      return 'Not found.';
    case 409:
      return 'This conflicts with the current state. Reload and try again.';
    case 410:
      return 'This link has expired or was already used.';
    case 429:
      return 'Too many attempts.';
    case 503:
      return 'The service is temporarily unavailable. Try again shortly.';
    default:
      return status >= 500 ? 'The server ran into a problem. Try again shortly.' : 'The request failed.';
  }
}
