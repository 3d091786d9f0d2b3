import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

export const SCATTER_STATES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;

/** A Monte Carlo study over manufacturing tolerances, run as a background job. */
export const scatterStudySchema = z.object({
  id: idSchema,
  variantId: idSchema.nullable(),
  state: z.enum(SCATTER_STATES),
  progress: z.number().describe('0…1'),
  samples: z.number().int(),
  seed: z.number().int(),
  result: z.unknown().nullable(),
  error: z.string().nullable(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type ScatterStudy = z.infer<typeof scatterStudySchema>;

export const startScatterBodySchema = z
  .strictObject({
    variantId: idSchema.optional(),
    part: z.unknown().optional(),
    /** Per primitive id: relative density scatter and absolute size scatter (m). */
    tolerances: z
      .record(
        z.string(),
        z.strictObject({
          density: z.number().min(0).max(0.5).optional(),
          size: z.number().min(0).max(0.05).optional(),
        }),
      )
      .optional(),
    samples: z
      .number({ message: 'must be a number' })
      .int({ message: 'must be a whole number' })
      .min(10, { message: 'must be at least 10' })
      .max(20_000, { message: 'must be at most 20000' }),
    seed: z
      .number()
      .int()
      .min(0)
      .max(2 ** 31 - 1)
      .optional(),
  })
  .refine((b) => (b.variantId === undefined) !== (b.part === undefined), { message: 'give either variantId or part', path: ['variantId'] });
