import type { ErrorProblem } from '@tumblewise/shared';

/** The one error type routes and services throw; the error handler turns it into the JSON body. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly headers?: Record<string, string>,
    /** Every problem found in an uploaded file, by line (answered as `problems`). */
    readonly problems?: readonly ErrorProblem[],
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(message: string, field?: string, code = 'invalid_input'): AppError {
    return new AppError(400, code, message, field);
  }
  /** A refused file whose problems are listed one by one (by line where there is one). */
  static fileProblems(message: string, field: string, problems: readonly ErrorProblem[], code = 'invalid_input'): AppError {
    return new AppError(400, code, message, field, undefined, problems);
  }
  static unauthorized(message = 'Sign in to continue.', code = 'not_signed_in'): AppError {
    return new AppError(401, code, message);
  }
  static forbidden(message = 'Your role in this workspace does not allow this.', code = 'forbidden'): AppError {
    return new AppError(403, code, message);
  }
  static notFound(what = 'That item'): AppError {
    return new AppError(404, 'not_found', `${what} was not found.`);
  }
  static conflict(code: string, message: string, field?: string): AppError {
    return new AppError(409, code, message, field);
  }
  static gone(code: string, message: string): AppError {
    return new AppError(410, code, message);
  }
}
