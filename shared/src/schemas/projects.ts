import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

/** Gear categories; each has its own indicative checks in the engine. */
export const GEAR_CATEGORIES = [
  'racket',
  'bat',
  'golf-wood',
  'flying-disc',
  'javelin',
  'bowling-ball',
  'juggling',
  'paddle',
  'other',
] as const;
export const gearCategorySchema = z.enum(GEAR_CATEGORIES, { message: `must be one of ${GEAR_CATEGORIES.join(', ')}` });
export type GearCategory = z.infer<typeof gearCategorySchema>;

export const projectSchema = z.object({
  id: idSchema,
  name: z.string(),
  category: gearCategorySchema,
  notes: z.string(),
  archived: z.boolean(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type Project = z.infer<typeof projectSchema>;

export const createProjectBodySchema = z.object({
  name: z
    .string({ message: 'is required' })
    .trim()
    .min(1, { message: 'is required' })
    .max(120, { message: 'must be at most 120 characters' }),
  category: gearCategorySchema,
  notes: z.string().max(5000, { message: 'must be at most 5000 characters' }).optional(),
});
export type CreateProjectBody = z.infer<typeof createProjectBodySchema>;
