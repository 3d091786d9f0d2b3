import { Router } from 'express';
import {
  solveAnswerSchema,
  solveRequestSchema,
  sweepAnswerSchema,
  sweepRequestSchema,
  type SolveAnswer,
  type SweepAnswer,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { abortOnClose, referencesFor, workspaceQuery } from '../analysis/compute-request';
import { routeGroup } from '../http/api-route';

/** The part inside a design request body, for looking up the stored materials and meshes it names. */
const partOf = (body: unknown) => (body as { part?: unknown } | null)?.part;

/**
 * Design to target, without saving: goal seek (which free parameters, within their bounds, reach
 * the target figures) and sweeps (figures and verdict over a grid of one or two parameters). Both
 * run on a compute thread; the engine checks the body there and names a bad field by its path.
 */
export function designRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '');

  route({
    method: 'post',
    path: '/solve',
    summary: 'Goal seek: change the free parameters within their bounds so the part meets the target figures; nothing is saved.',
    access: { kind: 'user' },
    body: solveRequestSchema,
    bodyValidatedBy: 'engine',
    query: workspaceQuery,
    errors: [404, 413, 422],
    success: {
      status: 200,
      description: 'met, closest (with the reason) or infeasible; the changed part, its report and the changes.',
      schema: solveAnswerSchema,
    },
    handler: async ({ body, query, auth }, _req, res) =>
      ctx.compute.run<SolveAnswer>(
        { kind: 'solve', input: body, references: await referencesFor(auth!.user.id, query.workspace, partOf(body)) },
        abortOnClose(res),
      ),
  });

  route({
    method: 'post',
    path: '/sweep',
    summary: 'Sweep one or two parameters over a grid: the verdict and the chosen figures at every point, first axis slowest.',
    access: { kind: 'user' },
    body: sweepRequestSchema,
    bodyValidatedBy: 'engine',
    query: workspaceQuery,
    errors: [404, 413, 422],
    success: {
      status: 200,
      description: 'The grid values of each axis and one point per combination, in row-major order.',
      schema: sweepAnswerSchema,
    },
    handler: async ({ body, query, auth }, _req, res) =>
      ctx.compute.run<SweepAnswer>(
        { kind: 'sweep', input: body, references: await referencesFor(auth!.user.id, query.workspace, partOf(body)) },
        abortOnClose(res),
      ),
  });

  return router;
}
