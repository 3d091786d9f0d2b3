import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import {
  acceptInvitationBodySchema,
  canAssignRole,
  createInvitationBodySchema,
  idSchema,
  invitationPreviewQuerySchema,
  invitationPreviewSchema,
  invitationSchema,
  sessionSchema,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { hashToken, newSecureToken } from '../accounts/secure-token';
import { setRefreshCookie } from '../accounts/refresh-cookie';
import { sessionBody } from '../accounts/session-body';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Invitation, Membership, User, Workspace } from '../models/init-models';
import { deliverInvitation } from './invitation-delivery';
import { assertSeatsFor } from '../billing/seats';

const invitationParams = z.object({ invitationId: idSchema });
const withInviter = [{ model: User, as: 'invitedBy' }];

/** Invitations of a workspace: create (e-mails the link), list, re-send, revoke. */
export function invitationRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const days = ctx.config.auth.invitationDays;

  route({
    method: 'get',
    path: '/invitations',
    summary: 'List the workspace’s invitations, newest first.',
    access: { kind: 'workspace', permission: 'invitations.manage' },
    success: { status: 200, description: 'Invitations of every status.', schema: z.array(invitationSchema) },
    handler: async (_input, req) => {
      const rows = await Invitation.findAll({
        where: { workspaceId: membershipOf(req).workspaceId },
        include: withInviter,
        order: [['createdAt', 'DESC']],
      });
      return rows.map((i) => i.toDto());
    },
  });

  route({
    method: 'post',
    path: '/invitations',
    summary: 'Invite someone by e-mail with a role.',
    access: { kind: 'workspace', permission: 'invitations.manage' },
    body: createInvitationBodySchema,
    errors: [409],
    success: { status: 201, description: 'The invitation; `delivery` tells whether the e-mail went out.', schema: invitationSchema },
    handler: async ({ body, auth }, req) => {
      const actor = membershipOf(req);
      if (!canAssignRole(actor.role, body.role)) throw AppError.forbidden('Only an owner can invite another owner.');
      const existingUser = await User.findOne({ where: { email: body.email } });
      if (existingUser && (await Membership.findOne({ where: { workspaceId: actor.workspaceId, userId: existingUser.id } }))) {
        throw AppError.conflict('already_member', `${body.email} is already a member of this workspace.`, 'email');
      }
      const { token, hash } = newSecureToken();
      const invitation = await ctx.sequelize.transaction(async (transaction) => {
        await Invitation.update(
          { status: 'expired' },
          {
            where: { workspaceId: actor.workspaceId, email: body.email, status: 'pending', expiresAt: { [Op.lte]: new Date() } },
            transaction,
          },
        );
        const pending = await Invitation.findOne({
          where: { workspaceId: actor.workspaceId, email: body.email, status: 'pending' },
          transaction,
        });
        if (pending)
          throw AppError.conflict('already_invited', `${body.email} already has a pending invitation. Re-send it instead.`, 'email');
        // Lock the workspace row so two invitations cannot take the last seat at once.
        const locked = (await Workspace.findByPk(actor.workspaceId, { transaction, lock: transaction.LOCK.UPDATE }))!;
        await assertSeatsFor(locked, ctx.config.billing.evaluationSeats, 1, { transaction });
        const created = await Invitation.create(
          {
            workspaceId: actor.workspaceId,
            email: body.email,
            role: body.role,
            tokenHash: hash,
            invitedById: auth!.user.id,
            acceptedById: null,
            expiresAt: new Date(Date.now() + days * 86400_000),
          },
          { transaction },
        );
        await recordAudit(
          {
            workspaceId: actor.workspaceId,
            actorId: auth!.user.id,
            action: 'invitation.created',
            targetType: 'invitation',
            targetId: created.id,
            targetLabel: body.email,
            details: { role: body.role },
          },
          transaction,
        );
        return created;
      });
      await deliverInvitation(ctx, invitation, token, auth!.user.id);
      await invitation.reload({ include: withInviter });
      return invitation.toDto();
    },
  });

  route({
    method: 'post',
    path: '/invitations/:invitationId/resend',
    summary: 'Send the invitation again with a new link (the old link stops working).',
    access: { kind: 'workspace', permission: 'invitations.manage' },
    params: invitationParams,
    errors: [409],
    success: { status: 200, description: 'The invitation after sending.', schema: invitationSchema },
    handler: async ({ params, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const invitation = await Invitation.findOne({ where: { id: params.invitationId, workspaceId } });
      if (!invitation) throw AppError.notFound('Invitation');
      if (invitation.status === 'accepted' || invitation.status === 'revoked') {
        throw AppError.conflict('invitation_closed', `This invitation was ${invitation.status}; create a new one instead.`);
      }
      if (invitation.effectiveStatus() === 'expired')
        await assertSeatsFor(membershipOf(req).workspace, ctx.config.billing.evaluationSeats, 1);
      const { token, hash } = newSecureToken();
      await invitation.update({ tokenHash: hash, status: 'pending', expiresAt: new Date(Date.now() + days * 86400_000) });
      await recordAudit({
        workspaceId,
        actorId: auth!.user.id,
        action: 'invitation.resent',
        targetType: 'invitation',
        targetId: invitation.id,
        targetLabel: invitation.email,
      });
      await deliverInvitation(ctx, invitation, token, auth!.user.id);
      await invitation.reload({ include: withInviter });
      return invitation.toDto();
    },
  });

  route({
    method: 'delete',
    path: '/invitations/:invitationId',
    summary: 'Revoke a pending invitation; its link stops working.',
    access: { kind: 'workspace', permission: 'invitations.manage' },
    params: invitationParams,
    errors: [409],
    success: { status: 200, description: 'The revoked invitation.', schema: invitationSchema },
    handler: async ({ params, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const invitation = await Invitation.findOne({ where: { id: params.invitationId, workspaceId }, include: withInviter });
      if (!invitation) throw AppError.notFound('Invitation');
      if (invitation.status === 'accepted')
        throw AppError.conflict('invitation_closed', 'This invitation was already accepted; remove the member instead.');
      if (invitation.status !== 'revoked') {
        await invitation.update({ status: 'revoked' });
        await recordAudit({
          workspaceId,
          actorId: auth!.user.id,
          action: 'invitation.revoked',
          targetType: 'invitation',
          targetId: invitation.id,
          targetLabel: invitation.email,
        });
      }
      return invitation.toDto();
    },
  });
}

/** The public side: preview an invitation from its link, and accept it. */
export function invitationAcceptRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '/invitations');

  route({
    method: 'get',
    path: '/preview',
    summary: 'What an invitation link offers, before accepting.',
    access: { kind: 'public' },
    query: invitationPreviewQuerySchema,
    errors: [410],
    success: { status: 200, description: 'The invitation.', schema: invitationPreviewSchema },
    handler: async ({ query }) => {
      const invitation = await openInvitation(query.token);
      const [workspace, inviter, account] = await Promise.all([
        Workspace.findByPk(invitation.workspaceId),
        invitation.invitedById ? User.findByPk(invitation.invitedById) : null,
        User.findOne({ where: { email: invitation.email } }),
      ]);
      return {
        workspaceName: workspace!.name,
        email: invitation.email,
        role: invitation.role,
        invitedBy: inviter?.name ?? null,
        accountExists: !!account,
        expiresAt: invitation.expiresAt.toISOString(),
      };
    },
  });

  route({
    method: 'post',
    path: '/accept',
    summary: 'Accept an invitation: creates the account when needed, or adds the membership to the signed-in user.',
    access: { kind: 'optional-user' },
    body: acceptInvitationBodySchema,
    errors: [409, 410],
    success: { status: 200, description: 'Signed in, with the joined workspace.', schema: sessionSchema },
    handler: async ({ body, auth }, req, res) => {
      const result = await ctx.sequelize.transaction(async (transaction) => {
        const invitation = await openInvitation(body.token, transaction);
        let user: User;
        let sessionId: string | null = null;
        let refreshToken: string | null = null;
        if (auth) {
          if (auth.user.email !== invitation.email) {
            throw AppError.conflict(
              'email_mismatch',
              `This invitation is for ${invitation.email}, but you are signed in as ${auth.user.email}. Sign out and open the link again.`,
            );
          }
          user = auth.user;
          sessionId = auth.sessionId;
        } else {
          if (await User.findOne({ where: { email: invitation.email }, transaction })) {
            throw AppError.conflict('account_exists', `${invitation.email} already has an account. Sign in to accept the invitation.`);
          }
          if (!body.name) throw AppError.badRequest('name is required to create your account.', 'name');
          if (!body.password) throw AppError.badRequest('password is required to create your account.', 'password');
          user = await User.create(
            { email: invitation.email, name: body.name, passwordHash: await ctx.passwords.hash(body.password) },
            { transaction },
          );
          ({ sessionId, refreshToken } = await ctx.sessions.start(user.id, req.get('user-agent'), transaction));
        }
        const target = (await Workspace.findByPk(invitation.workspaceId, { transaction, lock: transaction.LOCK.UPDATE }))!;
        if (target.effectiveState() === 'suspended')
          throw AppError.conflict('workspace_suspended', 'This workspace is suspended; the invitation cannot be accepted now.');
        const already = await Membership.findOne({ where: { workspaceId: invitation.workspaceId, userId: user.id }, transaction });
        if (!already) await assertSeatsFor(target, ctx.config.billing.evaluationSeats, 1, { acceptingPending: true, transaction });
        if (!already)
          await Membership.create({ workspaceId: invitation.workspaceId, userId: user.id, role: invitation.role }, { transaction });
        await invitation.update({ status: 'accepted', acceptedAt: new Date(), acceptedById: user.id }, { transaction });
        await recordAudit(
          {
            workspaceId: invitation.workspaceId,
            actorId: user.id,
            action: 'invitation.accepted',
            targetType: 'invitation',
            targetId: invitation.id,
            targetLabel: invitation.email,
            details: { role: invitation.role, newAccount: !auth },
          },
          transaction,
        );
        const workspace = (await Workspace.findByPk(invitation.workspaceId, { transaction }))!;
        return { user, sessionId: sessionId!, refreshToken, workspace };
      });
      if (result.refreshToken) setRefreshCookie(res, result.refreshToken, ctx.config.auth);
      return sessionBody(ctx, result.user, result.sessionId, result.workspace);
    },
  });

  return router;
}

/** A pending, unexpired invitation by its link token; 410 otherwise. */
async function openInvitation(token: string, transaction?: import('sequelize').Transaction): Promise<Invitation> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!invitation || invitation.effectiveStatus() !== 'pending') {
    const why = !invitation
      ? 'is not valid'
      : invitation.effectiveStatus() === 'expired'
        ? 'has expired'
        : `was ${invitation.effectiveStatus()}`;
    throw AppError.gone('invitation_invalid', `This invitation link ${why}. Ask the workspace admin for a new one.`);
  }
  return invitation;
}
