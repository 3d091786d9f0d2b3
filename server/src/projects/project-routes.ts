import { Router } from 'express';
import { z } from 'zod';
import { createProjectBodySchema, idSchema, projectSchema, updateProjectBodySchema } from '@tumblewise/shared';
import { recordAudit } from '../audit/audit-log';
import { findInWorkspace } from '../http/find-in-workspace';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Project } from '../models/init-models';

/** Projects of a workspace (the design screens build on these). */
export function projectRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'get',
    path: '/projects',
    summary: 'List the workspace’s projects, most recently changed first.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Projects.', schema: z.array(projectSchema) },
    handler: async (_input, req) => {
      const rows = await Project.findAll({ where: { workspaceId: membershipOf(req).workspaceId }, order: [['updatedAt', 'DESC']] });
      return rows.map((p) => p.toDto());
    },
  });

  route({
    method: 'post',
    path: '/projects',
    summary: 'Create a project.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    body: createProjectBodySchema,
    success: { status: 201, description: 'The new project.', schema: projectSchema },
    handler: async ({ body, auth }, req) => {
      const project = await Project.create({
        workspaceId: membershipOf(req).workspaceId,
        name: body.name,
        category: body.category,
        notes: body.notes ?? '',
        createdById: auth!.user.id,
      });
      return project.toDto();
    },
  });

  const params = z.object({ projectId: idSchema });

  route({
    method: 'get',
    path: '/projects/:projectId',
    summary: 'One project.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'The project.', schema: projectSchema },
    handler: async ({ params: p }, req) => (await findInWorkspace(Project, p.projectId, membershipOf(req).workspaceId, 'Project')).toDto(),
  });

  route({
    method: 'patch',
    path: '/projects/:projectId',
    summary: 'Rename, recategorise, annotate, archive or restore a project.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params,
    body: updateProjectBodySchema,
    success: { status: 200, description: 'The project.', schema: projectSchema },
    handler: async ({ params: p, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const project = await findInWorkspace(Project, p.projectId, workspaceId, 'Project');
      await project.update(body);
      if (body.archived !== undefined) {
        await recordAudit({
          workspaceId,
          actorId: auth!.user.id,
          action: body.archived ? 'project.archived' : 'project.restored',
          targetType: 'project',
          targetId: project.id,
          targetLabel: project.name,
        });
      }
      return project.toDto();
    },
  });
}
