import { Router } from 'express';
import { meSchema } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';
import { membershipsOf } from './session-body';

/** The signed-in user and their memberships. */
export function meRoutes(ctx: AppContext): Router {
  const router = Router();
  routeGroup(
    router,
    ctx.catalogue,
    '',
  )({
    method: 'get',
    path: '/me',
    summary: 'The signed-in user and the workspaces they belong to.',
    access: { kind: 'user' },
    success: { status: 200, description: 'User and memberships.', schema: meSchema },
    handler: async ({ auth }) => ({ user: auth!.user.toDto(), memberships: await membershipsOf(auth!.user.id) }),
  });
  return router;
}
