import type express from 'express';
import { z } from 'zod';
import { idSchema } from '@tumblewise/shared';
import { taskReferences } from '../compute/task-references';
import type { TaskReferences } from '../compute/compute-tasks';
import { AppError } from '../http/app-error';
import { Membership } from '../models/init-models';

// What the routes that hand a part document to the compute pool share: the `?workspace=` query that
// resolves stored materials and meshes, the membership check, and cancelling when the client leaves.

export const workspaceQuery = z.object({
  workspace: idSchema.optional().describe('resolve materialId and meshId against this workspace (you must be a member)'),
});

/** The caller must belong to a workspace named in `?workspace=` (404 otherwise, as for any workspace route). */
export async function assertMember(userId: string, workspaceId: string): Promise<void> {
  if (!(await Membership.findOne({ where: { workspaceId, userId } }))) throw AppError.notFound('Workspace');
}

/** References of a document in a workspace the caller belongs to (404 otherwise). */
export async function referencesFor(userId: string, workspaceId: string | undefined, doc: unknown): Promise<TaskReferences | undefined> {
  if (!workspaceId) return undefined;
  await assertMember(userId, workspaceId);
  return taskReferences(workspaceId, doc);
}

/**
 * Cancels the worker task when the client goes away before the answer is sent. Listens on the
 * response, not the socket: a keep-alive socket carries many requests, and a listener per request
 * on it would pile up until the connection closes.
 */
export function abortOnClose(res: express.Response): AbortSignal {
  const controller = new AbortController();
  res.once('close', () => {
    if (!res.writableFinished) controller.abort();
  });
  return controller.signal;
}
