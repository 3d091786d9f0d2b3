import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import { idSchema, materialBodySchema, materialSchema } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { Material } from '../models/init-models';

const params = z.object({ materialId: idSchema });

/** The material library (global, read-only) and the workspace's own materials. */
export function materialRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'get',
    path: '/materials',
    summary: 'The material library plus the workspace’s own materials.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Materials by name.', schema: z.array(materialSchema) },
    handler: async (_i, req) => {
      const rows = await Material.findAll({
        where: { [Op.or]: [{ workspaceId: null }, { workspaceId: membershipOf(req).workspaceId }] },
        order: [['name', 'ASC']],
      });
      return rows.map((m) => m.toDto());
    },
  });

  route({
    method: 'post',
    path: '/materials',
    summary: 'Add a workspace material.',
    access: { kind: 'workspace', permission: 'materials.manage' },
    body: materialBodySchema,
    success: { status: 201, description: 'The material.', schema: materialSchema },
    handler: async ({ body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const m = await Material.create({ ...body, workspaceId });
      await recordAudit({
        workspaceId,
        actorId: auth!.user.id,
        action: 'material.created',
        targetType: 'material',
        targetId: m.id,
        targetLabel: m.name,
      });
      return m.toDto();
    },
  });

  route({
    method: 'patch',
    path: '/materials/:materialId',
    summary: 'Change a workspace material (library materials are read-only).',
    access: { kind: 'workspace', permission: 'materials.manage' },
    params,
    body: materialBodySchema.partial(),
    success: { status: 200, description: 'The material.', schema: materialSchema },
    handler: async ({ params: p, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const m = await findInWorkspace(Material, p.materialId, workspaceId, 'Material');
      await m.update(body);
      await recordAudit({
        workspaceId,
        actorId: auth!.user.id,
        action: 'material.updated',
        targetType: 'material',
        targetId: m.id,
        targetLabel: m.name,
        details: body,
      });
      return m.toDto();
    },
  });

  route({
    method: 'delete',
    path: '/materials/:materialId',
    summary: 'Delete a workspace material.',
    access: { kind: 'workspace', permission: 'materials.manage' },
    params,
    success: { status: 204, description: 'Deleted.' },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const m = await findInWorkspace(Material, p.materialId, workspaceId, 'Material');
      await m.destroy();
      await recordAudit({
        workspaceId,
        actorId: auth!.user.id,
        action: 'material.deleted',
        targetType: 'material',
        targetId: m.id,
        targetLabel: m.name,
      });
      return undefined;
    },
  });
}
