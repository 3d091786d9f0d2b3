/** One problem found in an uploaded file: the line it is on (null for the file as a whole) and what is wrong there. */
export interface ErrorProblem {
  line: number | null;
  message: string;
}

/** The JSON error body every failing request answers with (no zod, so the apps' first chunk stays small). */
export interface ErrorBody {
  error: { code: string; message: string; field?: string; problems?: ErrorProblem[] };
}

function isProblem(value: unknown): value is ErrorProblem {
  const p = value as Record<string, unknown> | null;
  return (
    typeof p === 'object' &&
    p !== null &&
    typeof p.message === 'string' &&
    (p.line === null || (typeof p.line === 'number' && Number.isInteger(p.line)))
  );
}

/** True when `value` has the shape of our error body. */
export function isErrorBody(value: unknown): value is ErrorBody {
  const error = (value as { error?: unknown } | null)?.error as Record<string, unknown> | undefined;
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof error.code === 'string' &&
    typeof error.message === 'string' &&
    (error.field === undefined || typeof error.field === 'string') &&
    (error.problems === undefined || (Array.isArray(error.problems) && error.problems.every(isProblem)))
  );
}
