import { randomInt } from 'node:crypto';
import { Router } from 'express';
import { z } from 'zod';
import { idSchema, scatterStudySchema, startScatterBodySchema } from '@tumblewise/shared';
import { validatePartDocument } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { ScatterStudy, Variant } from '../models/init-models';

const params = z.object({ studyId: idSchema });

/** Scatter studies: start (queued as a background job), follow, cancel. */
export function scatterRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'post',
    path: '/scatter',
    summary: 'Start a Monte Carlo study over density and dimension tolerances of a variant or a part document.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    body: startScatterBodySchema,
    success: { status: 202, description: 'The queued study; follow it with GET /scatter/:studyId.', schema: scatterStudySchema },
    handler: async ({ body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      let document = body.part;
      if (body.variantId) document = (await findInWorkspace(Variant, body.variantId, workspaceId, 'Variant')).document;
      // Refuse a bad document now rather than in a failed job.
      const checked = validatePartDocument(document);
      if (!checked.ok)
        throw AppError.badRequest(`part ${checked.errors[0].path} ${checked.errors[0].message}.`, `part.${checked.errors[0].path}`);
      const ids = new Set(checked.value.primitives.map((p) => p.id));
      const unknown = Object.keys(body.tolerances ?? {}).find((id) => !ids.has(id));
      if (unknown) throw AppError.badRequest(`tolerances.${unknown} names no primitive of the part.`, `tolerances.${unknown}`);
      const study = await ScatterStudy.create({
        workspaceId,
        variantId: body.variantId ?? null,
        document,
        tolerances: body.tolerances ?? {},
        samples: body.samples,
        seed: body.seed ?? randomInt(0, 2 ** 31 - 1),
        createdById: auth!.user.id,
      });
      await ctx.scatter.enqueue(study.id);
      return (await study.reload()).toDto();
    },
  });

  route({
    method: 'get',
    path: '/scatter/:studyId',
    summary: 'A study’s state, progress and (when done) its result.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'The study.', schema: scatterStudySchema },
    handler: async ({ params: p }, req) =>
      (await findInWorkspace(ScatterStudy, p.studyId, membershipOf(req).workspaceId, 'Scatter study')).toDto(),
  });

  route({
    method: 'post',
    path: '/scatter/:studyId/cancel',
    summary: 'Cancel a queued or running study.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params,
    errors: [409],
    success: { status: 200, description: 'The cancelled study.', schema: scatterStudySchema },
    handler: async ({ params: p }, req) => {
      const study = await findInWorkspace(ScatterStudy, p.studyId, membershipOf(req).workspaceId, 'Scatter study');
      const [n] = await ScatterStudy.update({ state: 'cancelled' }, { where: { id: study.id, state: ['queued', 'running'] } });
      if (n === 0) throw AppError.conflict('study_finished', `This study is already ${study.state}.`);
      return (await study.reload()).toDto();
    },
  });
}
