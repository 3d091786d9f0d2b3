import express, { Router } from 'express';
import { z } from 'zod';
import { partDocumentSchema } from '@tumblewise/shared';
import { simulateInputSchema, type SimulationResult, type SpinReport } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';

const reportSchema = z.record(z.string(), z.unknown()).describe('The spin report (see the part document and report in the product brief).');

/** Analysis without saving (the larger JSON limit for part documents is set in app.ts): the spin report of a part document, and sampled torque-free motion. */
export function analysisRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '');

  route({
    method: 'post', path: '/analyze', summary: 'The spin report of a part document; nothing is saved.',
    access: { kind: 'user' }, body: partDocumentSchema, bodyValidatedBy: 'engine', errors: [413, 422],
    success: { status: 200, description: 'The spin report (SI units).', schema: reportSchema },
    handler: async ({ body }, req) => ctx.compute.run<SpinReport>({ kind: 'analyze', part: body }, abortOnClose(req)),
  });

  route({
    method: 'post', path: '/simulate', summary: 'Torque-free motion from the intended spin plus a misalignment: sampled ω, attitude quaternions, L, 2T, |L| and the polhode.',
    access: { kind: 'user' }, body: simulateInputSchema, bodyValidatedBy: 'engine', errors: [413, 422],
    success: { status: 200, description: 'Samples of the motion.', schema: z.record(z.string(), z.unknown()) },
    handler: async ({ body }, req) => ctx.compute.run<SimulationResult>({ kind: 'simulate', input: body }, abortOnClose(req)),
  });

  return router;
}

/** Cancels the worker task when the client goes away. */
function abortOnClose(req: express.Request): AbortSignal {
  const controller = new AbortController();
  req.socket.once('close', () => controller.abort());
  return controller.signal;
}
