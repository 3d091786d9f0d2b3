import { Router } from 'express';
import { z } from 'zod';
import { createProjectBodySchema, projectSchema } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Project } from '../models/init-models';

/** Projects of a workspace (the design screens build on these). */
export function projectRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'get', path: '/projects', summary: 'List the workspace’s projects, most recently changed first.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Projects.', schema: z.array(projectSchema) },
    handler: async (_input, req) => {
      const rows = await Project.findAll({ where: { workspaceId: membershipOf(req).workspaceId }, order: [['updatedAt', 'DESC']] });
      return rows.map((p) => p.toDto());
    },
  });

  route({
    method: 'post', path: '/projects', summary: 'Create a project.',
    access: { kind: 'workspace', permission: 'projects.edit' }, body: createProjectBodySchema,
    success: { status: 201, description: 'The new project.', schema: projectSchema },
    handler: async ({ body, auth }, req) => {
      const project = await Project.create({
        workspaceId: membershipOf(req).workspaceId, name: body.name, category: body.category, notes: body.notes ?? '', createdById: auth!.user.id,
      });
      return project.toDto();
    },
  });
}
