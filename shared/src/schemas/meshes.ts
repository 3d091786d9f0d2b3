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

/** Why a mesh in use cannot be deleted, naming where it is used (the first three parts); the server's 409 and the designer app say the same. */
export function meshInUseMessage(meshName: string, usage: MeshUsage): string {
  const shown = usage.parts.slice(0, 3).map((u) => {
    const where = [
      u.inDraft ? 'its draft' : '',
      u.variantNumbers.length
        ? `saved ${u.variantNumbers.length === 1 ? 'variant' : 'variants'} ${u.variantNumbers.map((n) => `v${n}`).join(', ')}`
        : '',
    ]
      .filter(Boolean)
      .join(' and ');
    return `${u.partName} (${where})`;
  });
  const more = usage.parts.length - shown.length;
  return (
    `The mesh “${meshName}” is still used by ${shown.join('; ')}${more > 0 ? ` and ${more} more ${more === 1 ? 'part' : 'parts'}` : ''}, so it cannot be deleted. ` +
    'Remove it from those drafts, or delete those parts; a saved variant keeps the mesh it was computed from.'
  );
}
