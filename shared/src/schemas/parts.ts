import { z } from 'zod';
import { idSchema, timestampSchema } from './common';
import { gearCategorySchema } from './projects';

export const VARIANT_STATUSES = ['draft', 'in_review', 'approved', 'changes_requested'] as const;
export const variantStatusSchema = z.enum(VARIANT_STATUSES);
export type VariantStatus = z.infer<typeof variantStatusSchema>;

/** One-line summary of a spin report, for lists. */
export const verdictSummarySchema = z.object({
  verdict: z.enum(['steady', 'watch', 'flip-prone']),
  nearestAxis: z.enum(['major', 'intermediate', 'minor']),
  mass: z.number(),
});

/** A part of a project: its autosaved draft document and its variants. */
export const partSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  /** The autosaved working document (any JSON; validated when analysed or saved as a variant). */
  draft: z.unknown(),
  /** Optimistic-locking counter of the draft: send it back with every save. */
  draftVersion: z.number().int(),
  latestVariant: z
    .object({ id: idSchema, number: z.number().int(), status: variantStatusSchema, summary: verdictSummarySchema.nullable() })
    .nullable(),
  variantCount: z.number().int(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type Part = z.infer<typeof partSchema>;

const name = z
  .string({ message: 'is required' })
  .trim()
  .min(1, { message: 'is required' })
  .max(120, { message: 'must be at most 120 characters' });

export const createPartBodySchema = z.strictObject({ name, draft: z.unknown().optional() });
export const savePartDraftBodySchema = z.strictObject({
  name: name.optional(),
  draft: z.unknown().optional(),
  draftVersion: z.number({ message: 'is required (the version you last loaded)' }).int(),
});

/** A saved variant: a frozen part document with its spin report. */
export const variantSchema = z.object({
  id: idSchema,
  partId: idSchema,
  number: z.number().int().describe('1, 2, 3 … within the part'),
  label: z.string(),
  notes: z.string(),
  document: z.unknown(),
  report: z.unknown(),
  engineVersion: z.string(),
  status: variantStatusSchema,
  author: z.object({ id: idSchema, name: z.string() }).nullable(),
  version: z.number().int().describe('optimistic-locking counter'),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type Variant = z.infer<typeof variantSchema>;

export const createVariantBodySchema = z.strictObject({
  label: z.string().trim().max(120, { message: 'must be at most 120 characters' }).optional(),
  notes: z.string().max(5000, { message: 'must be at most 5000 characters' }).optional(),
  document: z.unknown(),
});
export const updateVariantBodySchema = z.strictObject({
  label: z.string().trim().max(120, { message: 'must be at most 120 characters' }).optional(),
  notes: z.string().max(5000, { message: 'must be at most 5000 characters' }).optional(),
  version: z.number({ message: 'is required (the version you last loaded)' }).int(),
});

export const updateProjectBodySchema = z.strictObject({
  name: name.optional(),
  category: gearCategorySchema.optional(),
  notes: z.string().max(5000, { message: 'must be at most 5000 characters' }).optional(),
  archived: z.boolean({ message: 'must be true or false' }).optional(),
});
