import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';

const serviceState = z.enum(['up', 'down']);
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded', 'unavailable']),
  database: serviceState,
  mail: serviceState,
  payment: serviceState,
  checkedAt: z.string(),
});

async function databaseUp(ctx: AppContext): Promise<boolean> {
  try {
    await ctx.sequelize.query('select 1');
    return true;
  } catch {
    return false;
  }
}

export const livenessSchema = z.object({ status: z.literal('alive') });

/**
 * `GET /health/live`: the process answers HTTP; it touches no database, mail or payment service
 * (a load balancer's liveness probe, and the baseline of the throughput benchmark).
 * `GET /health`: 200 while the database answers (mail or payment down: degraded), 503 otherwise.
 */
export function healthRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '');
  route({
    method: 'get',
    path: '/health/live',
    summary: 'Whether this server process answers at all; checks no other service.',
    access: { kind: 'public' },
    success: { status: 200, description: 'The process is alive.', schema: livenessSchema },
    handler: (_input, _req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      return { status: 'alive' as const };
    },
  });
  route({
    method: 'get',
    path: '/health',
    summary: 'Whether the database, the mail server and the payment provider answer.',
    access: { kind: 'public' },
    errors: [503],
    success: { status: 200, description: 'Service states.', schema: healthSchema },
    handler: async (_input, _req, res) => {
      const [database, mail, payment] = await Promise.all([databaseUp(ctx), ctx.mailer.isReachable(), ctx.payment.isReachable()]);
      const state = (up: boolean) => (up ? 'up' : 'down') as 'up' | 'down';
      const body = {
        status: !database ? 'unavailable' : mail && payment ? 'ok' : 'degraded',
        database: state(database),
        mail: state(mail),
        payment: state(payment),
        checkedAt: new Date().toISOString(),
      };
      if (!database) {
        res
          .status(503)
          .set('Retry-After', '5')
          .json({ ...body, error: { code: 'database_unavailable', message: 'The database is not reachable right now.' } });
        return undefined;
      }
      return body;
    },
  });
  return router;
}
