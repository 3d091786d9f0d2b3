import { z } from 'zod';
import type { ErrorBody } from './error-body';

/** Row ids are UUIDs everywhere. */
export const idSchema = z.uuid({ message: 'must be an id' });

/** Trimmed, lower-cased e-mail address of reasonable length. */
export const emailSchema = z
  .string({ message: 'is required' })
  .trim()
  .toLowerCase()
  .max(254, { message: 'must be at most 254 characters' })
  .pipe(z.email({ message: 'must be an e-mail address' }));

const encoder = new TextEncoder();

/**
 * Password rule: 10 to 72 characters, and at most 72 bytes because bcrypt ignores the rest.
 */
export const passwordSchema = z
  .string({ message: 'is required' })
  .min(10, { message: 'must be at least 10 characters' })
  .max(72, { message: 'must be at most 72 characters' })
  .refine((p) => encoder.encode(p).length <= 72, { message: 'must be at most 72 bytes (fewer accented or emoji characters)' });

/** A person's display name. */
export const personNameSchema = z
  .string({ message: 'is required' })
  .trim()
  .min(1, { message: 'is required' })
  .max(120, { message: 'must be at most 120 characters' })
  .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), { message: 'must not contain control characters' });

/** A workspace's display name. */
export const workspaceNameSchema = z
  .string({ message: 'is required' })
  .trim()
  .min(2, { message: 'must be at least 2 characters' })
  .max(80, { message: 'must be at most 80 characters' })
  .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), { message: 'must not contain control characters' });

/** Opaque random token as sent in e-mails (base64url). */
export const tokenSchema = z
  .string({ message: 'is required' })
  .trim()
  .min(20, { message: 'is not a valid link token' })
  .max(200, { message: 'is not a valid link token' })
  .regex(/^[A-Za-z0-9_-]+$/, { message: 'is not a valid link token' });

/** ISO timestamp as sent by the API. */
export const timestampSchema = z.string();

/** Paging query shared by list endpoints. */
export const pageQuerySchema = z.object({
  page: z.coerce.number({ message: 'must be a number' }).int().min(1).max(100000).default(1),
  pageSize: z.coerce.number({ message: 'must be a number' }).int().min(1).max(200).default(25),
});

/** The JSON error body every failing request answers with (for the API description). */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    field: z.string().optional(),
    problems: z
      .array(
        z.object({
          line: z.number().int().nullable().describe('line of the file, 1 = the header; null for the file as a whole'),
          message: z.string(),
        }),
      )
      .optional()
      .describe('every problem found in an uploaded file (CSV import), when there are several'),
  }),
}) satisfies z.ZodType<ErrorBody>;

/** A page of rows. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
