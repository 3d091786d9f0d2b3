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

/** A part that uses an uploaded mesh: in its autosaved draft, in saved variants, or both. */
export const meshUserSchema = z.object({
  partId: idSchema,
  projectId: idSchema,
  partName: z.string(),
  /** The part's draft (what the editor shows) has a primitive with this mesh. */
  inDraft: z.boolean(),
  /** Numbers of the part's saved variants that have a primitive with this mesh, ascending. */
  variantNumbers: z.array(z.number().int()),
});
export type MeshUser = z.infer<typeof meshUserSchema>;

/** Where a mesh is used; a mesh with any user cannot be deleted. */
export const meshUsageSchema = z.object({ parts: z.array(meshUserSchema) });
export type MeshUsage = z.infer<typeof meshUsageSchema>;
