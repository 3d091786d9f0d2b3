import { Router } from 'express';
import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import {
  idSchema,
  operatorWorkspaceSchema,
  operatorWorkspacesQuerySchema,
  suspensionBodySchema,
  type OperatorWorkspace,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { Workspace } from '../models/init-models';
import { planCatalogue } from '../billing/plan-catalogue';

type Row = { id: string; members: string; last_activity: Date | null };

/** Platform operator pages: every workspace with its plan, seats and state; suspend and restore. Reads no designs. */
export function operatorRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '/operator');

  async function describe(workspaces: Workspace[]): Promise<OperatorWorkspace[]> {
    if (workspaces.length === 0) return [];
    const rows = await ctx.sequelize.query<Row>(
      `SELECT w.id, (SELECT count(*) FROM memberships m WHERE m.workspace_id = w.id) AS members,
              (SELECT max(a.created_at) FROM audit_events a WHERE a.workspace_id = w.id) AS last_activity
         FROM workspaces w WHERE w.id IN (:ids)`,
      { replacements: { ids: workspaces.map((w) => w.id) }, type: QueryTypes.SELECT },
    );
    const byId = new Map(rows.map((r) => [r.id, r]));
    return workspaces.map((w) => ({
      id: w.id,
      name: w.name,
      createdAt: w.createdAt.toISOString(),
      plan: planCatalogue(ctx.config.billing).find((p) => p.id === w.planId)?.name ?? w.planId ?? null,
      seats: w.subscriptionId ? (w.seats ?? 0) : ctx.config.billing.evaluationSeats,
      members: Number(byId.get(w.id)?.members ?? 0),
      state: w.effectiveState(),
      subscriptionStatus: w.subscriptionStatus ?? null,
      lastActivityAt: byId.get(w.id)?.last_activity ? new Date(byId.get(w.id)!.last_activity!).toISOString() : null,
      suspendedReason: w.suspendedReason ?? null,
    }));
  }

  route({
    method: 'get',
    path: '/workspaces',
    summary: 'Every workspace: name, created, plan, seats, members, state, last activity.',
    access: { kind: 'operator' },
    query: operatorWorkspacesQuerySchema,
    success: { status: 200, description: 'Workspaces.', schema: z.array(operatorWorkspaceSchema) },
    handler: async ({ query }) => {
      const all = await describe(await Workspace.findAll({ order: [['createdAt', 'DESC']], limit: 5000 }));
      const q = query.q?.toLowerCase();
      const filtered = all.filter((w) => (!q || w.name.toLowerCase().includes(q)) && (!query.state || w.state === query.state));
      const dir = query.order === 'asc' ? 1 : -1;
      const key = (w: OperatorWorkspace) => (w[query.sort] ?? '') as string | number;
      return filtered.sort((a, b) => (key(a) < key(b) ? -dir : key(a) > key(b) ? dir : 0));
    },
  });

  for (const [action, state] of [
    ['suspend', 'suspended'],
    ['restore', 'active'],
  ] as const) {
    route({
      method: 'post',
      path: `/workspaces/:workspaceId/${action}`,
      summary: action === 'suspend' ? 'Suspend a workspace (members can sign in and read, not edit).' : 'Restore a suspended workspace.',
      access: { kind: 'operator' },
      params: z.object({ workspaceId: idSchema }),
      body: suspensionBodySchema,
      errors: [404, 409],
      success: { status: 200, description: 'The workspace.', schema: operatorWorkspaceSchema },
      handler: async ({ params, body, auth }) => {
        const w = await Workspace.findByPk(params.workspaceId);
        if (!w) throw AppError.notFound('Workspace');
        if (action === 'suspend' && w.state === 'suspended')
          throw AppError.conflict('already_suspended', 'This workspace is already suspended.');
        if (action === 'restore' && w.state !== 'suspended') throw AppError.conflict('not_suspended', 'This workspace is not suspended.');
        // Restoring returns to what billing says: past due when a payment is still open.
        const restored = w.pastDueSince ? 'past_due' : w.subscriptionStatus === 'canceled' ? 'read_only' : 'active';
        await w.update({ state: state === 'active' ? restored : 'suspended', suspendedReason: state === 'suspended' ? body.reason : null });
        await recordAudit({
          workspaceId: w.id,
          actorId: auth!.user.id,
          action: action === 'suspend' ? 'workspace.suspended' : 'workspace.restored',
          targetType: 'workspace',
          targetId: w.id,
          targetLabel: w.name,
          details: { reason: body.reason },
        });
        return (await describe([w]))[0];
      },
    });
  }

  route({
    method: 'get',
    path: '/health',
    summary: 'Platform health: services, workspaces by state, queued and running studies.',
    access: { kind: 'operator' },
    success: { status: 200, description: 'Health.', schema: z.record(z.string(), z.unknown()) },
    handler: async () => {
      const [database, mail, payment] = await Promise.all([
        ctx.sequelize.query('select 1').then(
          () => true,
          () => false,
        ),
        ctx.mailer.isReachable(),
        ctx.payment.isReachable(),
      ]);
      const byState = await ctx.sequelize.query<{ state: string; n: string }>(
        'SELECT state, count(*) AS n FROM workspaces GROUP BY state',
        { type: QueryTypes.SELECT },
      );
      const studies = await ctx.sequelize.query<{ state: string; n: string }>(
        "SELECT state, count(*) AS n FROM scatter_studies WHERE state IN ('queued','running') GROUP BY state",
        { type: QueryTypes.SELECT },
      );
      return {
        services: { database: database ? 'up' : 'down', mail: mail ? 'up' : 'down', payment: payment ? 'up' : 'down' },
        workspacesByState: Object.fromEntries(byState.map((r) => [r.state, Number(r.n)])),
        studies: Object.fromEntries(studies.map((r) => [r.state, Number(r.n)])),
        process: { uptimeSeconds: Math.round(process.uptime()), rssMegabytes: Math.round(process.memoryUsage().rss / 1e6) },
      };
    },
  });
  return router;
}
