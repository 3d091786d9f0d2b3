import { Router } from 'express';
import { z } from 'zod';
import { createPartBodySchema, idSchema, partSchema, savePartDraftBodySchema, type Part as PartDto } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { Part, Project, Variant } from '../models/init-models';
import { verdictSummary } from '../variants/verdict-summary';

/** A part with its latest variant's verdict. */
async function partDto(part: Part): Promise<PartDto> {
  const [latest, count] = await Promise.all([
    Variant.findOne({ where: { partId: part.id, workspaceId: part.workspaceId }, order: [['number', 'DESC']] }),
    Variant.count({ where: { partId: part.id, workspaceId: part.workspaceId } }),
  ]);
  return {
    id: part.id,
    projectId: part.projectId,
    name: part.name,
    draft: part.draft,
    draftVersion: part.draftVersion,
    latestVariant: latest ? { id: latest.id, number: latest.number, status: latest.status, summary: verdictSummary(latest.report) } : null,
    variantCount: count,
    createdAt: part.createdAt.toISOString(),
    updatedAt: part.updatedAt.toISOString(),
  };
}

/** Parts of a project, with an autosaved draft under optimistic locking. */
export function partRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const projectParams = z.object({ projectId: idSchema });
  const partParams = z.object({ partId: idSchema });

  route({
    method: 'get',
    path: '/projects/:projectId/parts',
    summary: 'The parts of a project with their latest verdict.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: projectParams,
    success: { status: 200, description: 'Parts.', schema: z.array(partSchema) },
    handler: async ({ params }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Project, params.projectId, workspaceId, 'Project');
      const parts = await Part.findAll({ where: { workspaceId, projectId: params.projectId }, order: [['createdAt', 'ASC']] });
      return Promise.all(parts.map(partDto));
    },
  });

  route({
    method: 'post',
    path: '/projects/:projectId/parts',
    summary: 'Create a part.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: projectParams,
    body: createPartBodySchema,
    success: { status: 201, description: 'The part.', schema: partSchema },
    handler: async ({ params, body }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Project, params.projectId, workspaceId, 'Project');
      const part = await Part.create({ workspaceId, projectId: params.projectId, name: body.name, draft: body.draft ?? {} });
      return partDto(part);
    },
  });

  route({
    method: 'get',
    path: '/parts/:partId',
    summary: 'One part with its draft.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: partParams,
    success: { status: 200, description: 'The part.', schema: partSchema },
    handler: async ({ params }, req) => partDto(await findInWorkspace(Part, params.partId, membershipOf(req).workspaceId, 'Part')),
  });

  route({
    method: 'patch',
    path: '/parts/:partId',
    summary: 'Autosave the draft or rename; send the draftVersion you loaded (409 when someone saved since).',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: partParams,
    body: savePartDraftBodySchema,
    errors: [409],
    success: { status: 200, description: 'The part with its new draftVersion.', schema: partSchema },
    handler: async ({ params, body }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Part, params.partId, workspaceId, 'Part');
      const changes: Record<string, unknown> = { draftVersion: body.draftVersion + 1 };
      if (body.name !== undefined) changes.name = body.name;
      if (body.draft !== undefined) changes.draft = body.draft;
      // Compare-and-set on the version: a stale save changes nothing.
      const [updated] = await Part.update(changes as Partial<Part>, {
        where: { id: params.partId, workspaceId, draftVersion: body.draftVersion },
      });
      if (updated === 0) {
        throw AppError.conflict(
          'stale_version',
          'Someone saved this part after you loaded it. Reload to see their changes; your edits are still on your screen.',
          'draftVersion',
        );
      }
      return partDto((await Part.findByPk(params.partId))!);
    },
  });

  route({
    method: 'delete',
    path: '/parts/:partId',
    summary: 'Delete a part and its variants.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: partParams,
    success: { status: 204, description: 'Deleted.' },
    handler: async ({ params }, req) => {
      const part = await findInWorkspace(Part, params.partId, membershipOf(req).workspaceId, 'Part');
      await part.destroy();
      return undefined;
    },
  });
}
