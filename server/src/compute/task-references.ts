import type { ReferenceIds, TaskReferences } from './compute-tasks';
import { materialIdsOf, materialsById } from '../materials/material-references';
import { Mesh } from '../models/init-models';

const UUID = /^[0-9a-f-]{36}$/i;

/** The `meshId`s a part document mentions (untrusted JSON). */
function meshIdsOf(doc: unknown): string[] {
  const primitives = (doc as { primitives?: unknown } | null)?.primitives;
  if (!Array.isArray(primitives)) return [];
  const ids = primitives.map((p) => (p as { meshId?: unknown })?.meshId).filter((id): id is string => typeof id === 'string');
  return [...new Set(ids)].filter((id) => UUID.test(id)).slice(0, 50);
}

/** Materials and stored meshes of this workspace that a document refers to, for the compute pool. */
export function taskReferences(workspaceId: string, doc: unknown): Promise<TaskReferences> {
  return referencesByIds(workspaceId, { materialIds: materialIdsOf(doc), meshIds: meshIdsOf(doc) });
}

/** This workspace's stored meshes that a document refers to (no materials), for drawing it. */
export function meshReferences(workspaceId: string, doc: unknown): Promise<TaskReferences> {
  return referencesByIds(workspaceId, { materialIds: [], meshIds: meshIdsOf(doc) });
}

/** Library and workspace materials, and this workspace's stored meshes, by id (unknown ids are left out). */
export async function referencesByIds(workspaceId: string, ids: ReferenceIds): Promise<TaskReferences> {
  const uuids = (list: string[]) => list.filter((id) => UUID.test(id));
  const meshIds = uuids(ids.meshIds);
  const [materials, meshes] = await Promise.all([
    materialsById(workspaceId, uuids(ids.materialIds)),
    meshIds.length ? Mesh.findAll({ where: { id: meshIds, workspaceId }, attributes: ['id', 'data'] }) : Promise.resolve([]),
  ]);
  return { materials, meshes: Object.fromEntries(meshes.map((m) => [m.id, new Uint8Array(m.data)])) };
}
