import { Router } from 'express';
import { z } from 'zod';
import {
  can,
  idSchema,
  requestReviewBodySchema,
  reviewCommentBodySchema,
  reviewDecisionBodySchema,
  reviewThreadSchema,
  type ReviewThread,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { reviewRequestMail } from '../mail/messages';
import { Membership, Part, ReviewEntry, User, Variant } from '../models/init-models';

const params = z.object({ variantId: idSchema });

async function thread(variant: Variant): Promise<ReviewThread> {
  const entries = await ReviewEntry.findAll({
    where: { variantId: variant.id, workspaceId: variant.workspaceId },
    include: [
      { model: User, as: 'author' },
      { model: User, as: 'reviewer' },
    ],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return { status: variant.status, entries: entries.map((e) => e.toDto()) };
}

/** Sign-off of a variant: draft → in_review → approved | changes_requested, with a comment thread. */
export function reviewRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'get',
    path: '/variants/:variantId/review',
    summary: 'The sign-off thread of a variant.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'Status and entries.', schema: reviewThreadSchema },
    handler: async ({ params: p }, req) => thread(await findInWorkspace(Variant, p.variantId, membershipOf(req).workspaceId, 'Variant')),
  });

  route({
    method: 'post',
    path: '/variants/:variantId/review/request',
    summary: 'Ask a reviewer to sign the variant off (e-mails them).',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params,
    body: requestReviewBodySchema,
    errors: [409],
    success: { status: 200, description: 'The thread.', schema: reviewThreadSchema },
    handler: async ({ params: p, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      if (variant.status === 'in_review') throw AppError.conflict('already_in_review', 'This variant is already waiting for a review.');
      if (variant.status === 'approved')
        throw AppError.conflict('already_approved', 'This variant is approved; save a new variant to change it.');
      const reviewer = await Membership.findOne({
        where: { workspaceId, userId: body.reviewerId },
        include: [{ model: User, as: 'user', required: true }],
      });
      if (!reviewer) throw AppError.badRequest('reviewerId is not a member of this workspace.', 'reviewerId');
      if (!can(reviewer.role, 'review.decide'))
        throw AppError.badRequest('reviewerId must be a member who may approve (reviewer, admin or owner).', 'reviewerId');
      await ctx.sequelize.transaction(async (transaction) => {
        await variant.update({ status: 'in_review', version: variant.version + 1 }, { transaction });
        await ReviewEntry.create(
          {
            workspaceId,
            variantId: variant.id,
            kind: 'requested',
            authorId: auth!.user.id,
            reviewerId: body.reviewerId,
            body: body.message ?? '',
          },
          { transaction },
        );
        await recordAudit(
          {
            workspaceId,
            actorId: auth!.user.id,
            action: 'review.requested',
            targetType: 'variant',
            targetId: variant.id,
            targetLabel: `v${variant.number}`,
            details: { reviewer: reviewer.user!.email },
          },
          transaction,
        );
      });
      const part = await Part.findByPk(variant.partId);
      ctx.mailer
        .send(
          reviewRequestMail({
            to: reviewer.user!.email,
            reviewerName: reviewer.user!.name,
            requesterName: auth!.user.name,
            variantLabel: `v${variant.number}`,
            partName: part?.name ?? 'a part',
            message: body.message ?? '',
            url: `${ctx.config.publicUrl}/review/${variant.id}`,
          }),
        )
        .catch((err) => ctx.logger.warn({ err: String(err), variantId: variant.id }, 'review request e-mail not sent'));
      return thread(variant);
    },
  });

  route({
    method: 'post',
    path: '/variants/:variantId/review/comments',
    summary: 'Comment on a variant.',
    access: { kind: 'workspace', permission: 'review.comment' },
    params,
    body: reviewCommentBodySchema,
    success: { status: 201, description: 'The thread.', schema: reviewThreadSchema },
    handler: async ({ params: p, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      await ReviewEntry.create({
        workspaceId,
        variantId: variant.id,
        kind: 'comment',
        authorId: auth!.user.id,
        reviewerId: null,
        body: body.body,
      });
      return thread(variant);
    },
  });

  route({
    method: 'post',
    path: '/variants/:variantId/review/decision',
    summary: 'Approve the variant or send it back with changes requested.',
    access: { kind: 'workspace', permission: 'review.decide' },
    params,
    body: reviewDecisionBodySchema,
    errors: [409],
    success: { status: 200, description: 'The thread.', schema: reviewThreadSchema },
    handler: async ({ params: p, body, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      if (variant.status !== 'in_review')
        throw AppError.conflict('not_in_review', 'Only a variant waiting for review can be approved or sent back. Ask for a review first.');
      await ctx.sequelize.transaction(async (transaction) => {
        await variant.update({ status: body.decision, version: variant.version + 1 }, { transaction });
        await ReviewEntry.create(
          { workspaceId, variantId: variant.id, kind: body.decision, authorId: auth!.user.id, reviewerId: null, body: body.body ?? '' },
          { transaction },
        );
        await recordAudit(
          {
            workspaceId,
            actorId: auth!.user.id,
            action: `review.${body.decision}`,
            targetType: 'variant',
            targetId: variant.id,
            targetLabel: `v${variant.number}`,
          },
          transaction,
        );
      });
      return thread(variant);
    },
  });
}
