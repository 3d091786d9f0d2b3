import type { z } from 'zod';
import { formatJsonPath } from '@tumblewise/shared';
import { AppError } from './app-error';

/**
 * Parses `value` with `schema`; on failure throws a 400 naming the first offending field
 * by its JSON path (e.g. `email`, `primitives[2].radius`).
 */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, where: 'body' | 'query' | 'params'): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const field = formatJsonPath(issue.path);
  if (issue.code === 'unrecognized_keys') {
    const key = issue.keys[0];
    throw AppError.badRequest(`${key} is not a known field.`, field ? `${field}.${key}` : key);
  }
  if (!field) throw AppError.badRequest(where === 'body' ? `The request body ${issue.message}.` : `The ${where} ${issue.message}.`);
  const message = issue.code === 'invalid_type' && issue.input === undefined ? `${field} is required.` : `${field} ${issue.message}.`;
  throw AppError.badRequest(message, field);
}
