import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

/** An uploaded STL solid with its checks. */
export const meshSchema = z.object({
  id: idSchema,
  name: z.string(),
  sha256: z.string(),
  byteSize: z.number().int(),
  triangleCount: z.number().int(),
  format: z.enum(['binary', 'ascii']),
  /** Problems found and what was fixed (an inside-out mesh is flipped and reported). */
  report: z.object({ fixed: z.array(z.string()), warnings: z.array(z.string()) }),
  createdAt: timestampSchema,
});
export type Mesh = z.infer<typeof meshSchema>;
