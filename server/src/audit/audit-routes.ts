import { Router } from 'express';
import { Op, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import { auditEventSchema, auditQuerySchema } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { AuditEvent, User } from '../models/init-models';

/** The workspace's audit trail, newest first, paged and filterable. */
export function auditRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  route({
    method: 'get',
    path: '/audit',
    summary: 'Page through the audit trail (filter by action, actor, time).',
    access: { kind: 'workspace', permission: 'audit.read' },
    query: auditQuerySchema,
    success: {
      status: 200,
      description: 'One page of events.',
      schema: z.object({ items: z.array(auditEventSchema), total: z.number(), page: z.number(), pageSize: z.number() }),
    },
    handler: async ({ query }, req) => {
      const { workspaceId } = membershipOf(req);
      const where: WhereOptions<AuditEvent> = { workspaceId };
      if (query.action) Object.assign(where, { action: query.action.endsWith('.') ? { [Op.startsWith]: query.action } : query.action });
      if (query.actor) Object.assign(where, { actorId: query.actor });
      if (query.from || query.to) {
        Object.assign(where, {
          createdAt: { ...(query.from ? { [Op.gte]: new Date(query.from) } : {}), ...(query.to ? { [Op.lte]: new Date(query.to) } : {}) },
        });
      }
      const { rows, count } = await AuditEvent.findAndCountAll({
        where,
        include: [{ model: User, as: 'actor' }],
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
        limit: query.pageSize,
        offset: (query.page - 1) * query.pageSize,
      });
      return { items: rows.map((e) => e.toDto()), total: count, page: query.page, pageSize: query.pageSize };
    },
  });
}
