/** The JSON error body every failing request answers with (no zod, so the apps' first chunk stays small). */
export interface ErrorBody {
  error: { code: string; message: string; field?: string };
}

/** True when `value` has the shape of our error body. */
export function isErrorBody(value: unknown): value is ErrorBody {
  const error = (value as { error?: unknown } | null)?.error as Record<string, unknown> | undefined;
  return typeof error === 'object' && error !== null && typeof error.code === 'string' && typeof error.message === 'string'
    && (error.field === undefined || typeof error.field === 'string');
}
