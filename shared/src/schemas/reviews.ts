import { z } from 'zod';
import { idSchema, timestampSchema } from './common';
import { variantStatusSchema } from './parts';

/** The sign-off thread of a variant: requests, comments and decisions in time order. */
export const reviewEntrySchema = z.object({
  id: idSchema,
  kind: z.enum(['requested', 'comment', 'approved', 'changes_requested']),
  author: z.object({ id: idSchema, name: z.string() }).nullable(),
  reviewer: z.object({ id: idSchema, name: z.string() }).nullable().describe('for a request: who was asked'),
  body: z.string(),
  createdAt: timestampSchema,
});
export type ReviewEntry = z.infer<typeof reviewEntrySchema>;

export const reviewThreadSchema = z.object({ status: variantStatusSchema, entries: z.array(reviewEntrySchema) });
export type ReviewThread = z.infer<typeof reviewThreadSchema>;

const body = z
  .string({ message: 'is required' })
  .trim()
  .min(1, { message: 'is required' })
  .max(5000, { message: 'must be at most 5000 characters' });

export const requestReviewBodySchema = z.strictObject({ reviewerId: idSchema, message: z.string().trim().max(5000).optional() });
export const reviewCommentBodySchema = z.strictObject({ body });
export const reviewDecisionBodySchema = z.strictObject({
  decision: z.enum(['approved', 'changes_requested'], { message: 'must be "approved" or "changes_requested"' }),
  body: z.string().trim().max(5000, { message: 'must be at most 5000 characters' }).optional(),
});
