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

/** Library materials and this workspace's, by id, for the engine's resolver (unknown ids are left out). */
export async function materialsById(workspaceId: string, ids: string[]): Promise<Record<string, ResolvedMaterial>> {
  if (ids.length === 0) return {};
  const rows = await Material.findAll({ where: { id: ids, [Op.or]: [{ workspaceId: null }, { workspaceId }] } });
  return Object.fromEntries(rows.map((m) => [m.id, { density: m.density, tolerance: { density: m.densityTolerance } }]));
}
