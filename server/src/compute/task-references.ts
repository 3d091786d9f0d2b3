import type { TaskReferences } from './compute-tasks';
import { materialReferences } from '../materials/material-references';
import { Mesh } from '../models/init-models';

/** The `meshId`s a part document mentions (untrusted JSON). */
function meshIdsOf(doc: unknown): string[] {
  const primitives = (doc as { primitives?: unknown } | null)?.primitives;
  if (!Array.isArray(primitives)) return [];
  const ids = primitives.map((p) => (p as { meshId?: unknown })?.meshId).filter((id): id is string => typeof id === 'string');
  return [...new Set(ids)].filter((id) => /^[0-9a-f-]{36}$/i.test(id)).slice(0, 50);
}

/** Materials and stored meshes of this workspace that a document refers to, for the compute pool. */
export async function taskReferences(workspaceId: string, doc: unknown): Promise<TaskReferences> {
  const meshIds = meshIdsOf(doc);
  const [materials, meshes] = await Promise.all([
    materialReferences(workspaceId, doc),
    meshIds.length ? Mesh.findAll({ where: { id: meshIds, workspaceId }, attributes: ['id', 'data'] }) : Promise.resolve([]),
  ]);
  return { materials, meshes: Object.fromEntries(meshes.map((m) => [m.id, new Uint8Array(m.data)])) };
}
