import { Op } from 'sequelize';
import type { ResolvedMaterial } from '@tumblewise/engine';
import { Material } from '../models/init-models';

/** The `materialId`s a part document mentions (untrusted JSON: anything not a string is ignored). */
export function materialIdsOf(doc: unknown): string[] {
  const primitives = (doc as { primitives?: unknown } | null)?.primitives;
  if (!Array.isArray(primitives)) return [];
  const ids = primitives.map((p) => (p as { materialId?: unknown })?.materialId).filter((id): id is string => typeof id === 'string');
  return [...new Set(ids)].filter((id) => /^[0-9a-f-]{36}$/i.test(id)).slice(0, 500);
}

/** Loads the library and workspace materials a document refers to, for the engine's resolver. */
export async function materialReferences(workspaceId: string, doc: unknown): Promise<Record<string, ResolvedMaterial>> {
  const ids = materialIdsOf(doc);
  if (ids.length === 0) return {};
  const rows = await Material.findAll({ where: { id: ids, [Op.or]: [{ workspaceId: null }, { workspaceId }] } });
  return Object.fromEntries(rows.map((m) => [m.id, { density: m.density, tolerance: { density: m.densityTolerance } }]));
}
