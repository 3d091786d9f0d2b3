import express, { Router } from 'express';
import { z } from 'zod';
import { partDocumentSchema } from '@tumblewise/shared';
import { simulateInputSchema, type SimulationResult } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { routeGroup } from '../http/api-route';
import { AppError } from '../http/app-error';
import { referencesByIds } from '../compute/task-references';
import type { ReferenceIds } from '../compute/compute-tasks';
import { abortOnClose, assertMember, referencesFor, workspaceQuery } from './compute-request';

/** The request body as text: `app.ts` reads `/analyze` bodies unparsed, for the worker thread to parse. */
function bodyText(req: express.Request): string {
  if (typeof req.body !== 'string')
    throw AppError.badRequest('Send the part document as JSON, with Content-Type: application/json.', 'body');
  return req.body;
}

const reportSchema = z.record(z.string(), z.unknown()).describe('The spin report (see the part document and report in the product brief).');

/** Analysis without saving (the larger JSON limit for part documents is set in app.ts): the spin report of a part document, and sampled torque-free motion. */
export function analysisRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '');

  route({
    method: 'post',
    path: '/analyze',
    summary: 'The spin report of a part document; nothing is saved.',
    access: { kind: 'user' },
    body: partDocumentSchema,
    bodyValidatedBy: 'engine',
    query: workspaceQuery,
    errors: [404, 413, 422],
    success: { status: 200, description: 'The spin report (SI units).', schema: reportSchema },
    // The body stays text until a worker thread parses, checks and analyses it and answers the
    // report as text: the event loop only passes strings (README, "Performance").
    handler: async ({ query, auth }, req, res) => {
      const json = bodyText(req);
      const workspaceId = query.workspace;
      if (workspaceId) await assertMember(auth!.user.id, workspaceId);
      const load = workspaceId ? (ids: ReferenceIds) => referencesByIds(workspaceId, ids) : undefined;
      const report = await ctx.compute.analyzeJson(json, load, abortOnClose(res));
      res.status(200).type('application/json').send(report);
    },
  });

  route({
    method: 'post',
    path: '/simulate',
    summary: 'Torque-free motion from the intended spin plus a misalignment: sampled ω, attitude quaternions, L, 2T, |L| and the polhode.',
    access: { kind: 'user' },
    body: simulateInputSchema,
    bodyValidatedBy: 'engine',
    query: workspaceQuery,
    errors: [404, 413, 422],
    success: { status: 200, description: 'Samples of the motion.', schema: z.record(z.string(), z.unknown()) },
    handler: async ({ body, query, auth }, _req, res) =>
      ctx.compute.run<SimulationResult>(
        {
          kind: 'simulate',
          input: body,
          references: await referencesFor(auth!.user.id, query.workspace, (body as { part?: unknown } | null)?.part),
        },
        abortOnClose(res),
      ),
  });

  return router;
}
