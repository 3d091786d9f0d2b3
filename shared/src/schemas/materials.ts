import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

export const MATERIAL_FAMILIES = ['wood', 'metal', 'composite', 'polymer', 'foam', 'elastomer', 'natural', 'other'] as const;

/** A material: nominal density (kg/m³), its typical relative scatter, and where the figure comes from. */
export const materialSchema = z.object({
  id: idSchema,
  name: z.string(),
  family: z.enum(MATERIAL_FAMILIES),
  density: z.number().describe('kg/m³'),
  densityTolerance: z.number().describe('relative, e.g. 0.05 for ±5 %'),
  source: z.string().describe('handbook, standard, or "common practice"'),
  scope: z.enum(['library', 'workspace']).describe('library: the global seeded list; workspace: this team’s own'),
  createdAt: timestampSchema,
});
export type Material = z.infer<typeof materialSchema>;

const text = (max: number) =>
  z
    .string({ message: 'is required' })
    .trim()
    .min(1, { message: 'is required' })
    .max(max, { message: `must be at most ${max} characters` });

export const materialBodySchema = z.strictObject({
  name: text(120),
  family: z.enum(MATERIAL_FAMILIES, { message: `must be one of ${MATERIAL_FAMILIES.join(', ')}` }),
  density: z
    .number({ message: 'must be a number (kg/m³)' })
    .positive({ message: 'must be greater than zero' })
    .max(25_000, { message: 'must be at most 25000 kg/m³' }),
  densityTolerance: z
    .number({ message: 'must be a number' })
    .min(0, { message: 'must not be negative' })
    .max(0.5, { message: 'must be at most 0.5 (±50 %)' }),
  source: text(300),
});
export type MaterialBody = z.infer<typeof materialBodySchema>;
