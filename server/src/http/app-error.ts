/** The one error type routes and services throw; the error handler turns it into the JSON body. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(message: string, field?: string, code = 'invalid_input'): AppError { return new AppError(400, code, message, field); }
  static unauthorized(message = 'Sign in to continue.', code = 'not_signed_in'): AppError { return new AppError(401, code, message); }
  static forbidden(message = 'Your role in this workspace does not allow this.', code = 'forbidden'): AppError { return new AppError(403, code, message); }
  static notFound(what = 'That item'): AppError { return new AppError(404, 'not_found', `${what} was not found.`); }
  static conflict(code: string, message: string, field?: string): AppError { return new AppError(409, code, message, field); }
  static gone(code: string, message: string): AppError { return new AppError(410, code, message); }
}
