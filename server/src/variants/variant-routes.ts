import { Router } from 'express';
import { z } from 'zod';
import { createVariantBodySchema, idSchema, updateVariantBodySchema, variantSchema } from '@tumblewise/shared';
import type { SpinReport } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { taskReferences } from '../compute/task-references';
import { Part, User, Variant } from '../models/init-models';
import { ENGINE_VERSION } from './engine-version';

const withAuthor = [{ model: User, as: 'author' }];

/** Variants of a part: saving one stores its part document and its spin report. */
export function variantRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const partParams = z.object({ partId: idSchema });
  const variantParams = z.object({ variantId: idSchema });

  route({
    method: 'get',
    path: '/parts/:partId/variants',
    summary: 'The variants of a part, oldest first.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: partParams,
    success: { status: 200, description: 'Variants with their documents and reports.', schema: z.array(variantSchema) },
    handler: async ({ params }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Part, params.partId, workspaceId, 'Part');
      const rows = await Variant.findAll({
        where: { workspaceId, partId: params.partId },
        include: withAuthor,
        order: [['number', 'ASC']],
      });
      return rows.map((v) => v.toDto());
    },
  });

  route({
    method: 'post',
    path: '/parts/:partId/variants',
    summary: 'Save the document as a new variant; the server computes and stores its spin report.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: partParams,
    body: createVariantBodySchema,
    errors: [422],
    success: { status: 201, description: 'The new variant.', schema: variantSchema },
    handler: async ({ params, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Part, params.partId, workspaceId, 'Part');
      // Analyse first: a document the engine refuses is never saved.
      const report = await ctx.compute.run<SpinReport>({
        kind: 'analyze',
        part: body.document,
        references: await taskReferences(workspaceId, body.document),
      });
      const variant = await ctx.sequelize.transaction(async (transaction) => {
        await Part.findOne({ where: { id: params.partId, workspaceId }, transaction, lock: transaction.LOCK.UPDATE });
        const last = (await Variant.max<number, Variant>('number', { where: { partId: params.partId }, transaction })) ?? 0;
        const created = await Variant.create(
          {
            workspaceId,
            partId: params.partId,
            number: last + 1,
            label: body.label ?? '',
            notes: body.notes ?? '',
            document: body.document,
            report,
            engineVersion: ENGINE_VERSION,
            authorId: auth!.user.id,
          },
          { transaction },
        );
        await recordAudit(
          {
            workspaceId,
            actorId: auth!.user.id,
            action: 'variant.saved',
            targetType: 'variant',
            targetId: created.id,
            targetLabel: `v${created.number} ${created.label}`.trim(),
          },
          transaction,
        );
        return created;
      });
      await variant.reload({ include: withAuthor });
      return variant.toDto();
    },
  });

  route({
    method: 'get',
    path: '/variants/:variantId',
    summary: 'One variant.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: variantParams,
    success: { status: 200, description: 'The variant.', schema: variantSchema },
    handler: async ({ params }, req) =>
      (await findInWorkspace(Variant, params.variantId, membershipOf(req).workspaceId, 'Variant', { include: withAuthor })).toDto(),
  });

  route({
    method: 'patch',
    path: '/variants/:variantId',
    summary: 'Change a variant’s label or notes; send the version you loaded (409 when stale).',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: variantParams,
    body: updateVariantBodySchema,
    errors: [409],
    success: { status: 200, description: 'The variant.', schema: variantSchema },
    handler: async ({ params, body }, req) => {
      const { workspaceId } = membershipOf(req);
      await findInWorkspace(Variant, params.variantId, workspaceId, 'Variant');
      const { version, ...changes } = body;
      const [updated] = await Variant.update(
        { ...changes, version: version + 1 },
        { where: { id: params.variantId, workspaceId, version } },
      );
      if (updated === 0)
        throw AppError.conflict(
          'stale_version',
          'This variant changed after you loaded it. Reload to see the change; your text is still on your screen.',
          'version',
        );
      return (await Variant.findByPk(params.variantId, { include: withAuthor }))!.toDto();
    },
  });
}
