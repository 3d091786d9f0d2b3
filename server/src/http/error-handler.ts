import type { ErrorRequestHandler, RequestHandler } from 'express';
import {
  ConnectionError,
  ConnectionRefusedError,
  ConnectionAcquireTimeoutError,
  ConnectionTimedOutError,
  HostNotReachableError,
} from 'sequelize';
import type { Logger } from 'pino';
import type { ErrorBody } from '@tumblewise/shared';
import { AppError } from './app-error';

/** Errors from body parsing, multer and the database, mapped to our statuses. */
function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  const e = err as { type?: string; status?: number; code?: string; name?: string; message?: string };
  if (e?.type === 'entity.too.large') return new AppError(413, 'too_large', 'The request body is too large.');
  if (e?.type === 'entity.parse.failed') return AppError.badRequest('The request body is not valid JSON.', undefined, 'invalid_json');
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported')
    return new AppError(415, 'unsupported_encoding', 'Send the body as UTF-8 JSON.');
  if (e?.code === 'LIMIT_FILE_SIZE') return new AppError(413, 'too_large', 'The uploaded file is too large.');
  if (
    err instanceof ConnectionError ||
    err instanceof ConnectionRefusedError ||
    err instanceof ConnectionAcquireTimeoutError ||
    err instanceof ConnectionTimedOutError ||
    err instanceof HostNotReachableError ||
    e?.code === 'ECONNREFUSED' ||
    e?.code === '57P01'
  ) {
    return new AppError(503, 'database_unavailable', 'The database is not reachable right now. Try again in a moment.', undefined, {
      'Retry-After': '5',
    });
  }
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500)
    return new AppError(e.status, 'bad_request', 'The request could not be read.');
  return new AppError(500, 'internal', 'Something went wrong on our side. It has been logged.');
}

/** The one error handler: JSON body `{ error: { code, message, field?, problems? } }`, no stack traces. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const appError = toAppError(err);
    if (appError.status >= 500) logger.error({ err, method: req.method, url: req.originalUrl }, 'request failed');
    if (res.headersSent) return;
    if (appError.headers) res.set(appError.headers);
    const body: ErrorBody['error'] = { code: appError.code, message: appError.message };
    if (appError.field) body.field = appError.field;
    if (appError.problems?.length) body.problems = appError.problems.map(({ line, message }) => ({ line, message }));
    res.status(appError.status).json({ error: body });
  };
}

/** The last handler under /api: an unknown API path answers a JSON 404. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'no_such_route', `There is no ${req.method} ${req.path} in this API.`));
};
