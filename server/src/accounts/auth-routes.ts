import { Router } from 'express';
import { UniqueConstraintError } from 'sequelize';
import { z } from 'zod';
import {
  passwordResetBodySchema,
  passwordResetConfirmBodySchema,
  sessionSchema,
  signinBodySchema,
  signupBodySchema,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { ipAndEmail, limitAttempts } from '../http/attempt-limits';
import { passwordResetMail } from '../mail/messages';
import { Membership, PasswordReset, User, Workspace } from '../models/init-models';
import { clearRefreshCookie, readRefreshCookie, setRefreshCookie } from './refresh-cookie';
import { hashToken, newSecureToken } from './secure-token';
import { sessionBody } from './session-body';

const messageSchema = z.object({ message: z.string() });

/** Sign-up, sign-in, refresh, sign-out and password reset under /auth. */
export function authRoutes(ctx: AppContext): Router {
  const router = Router();
  const route = routeGroup(router, ctx.catalogue, '/auth');
  const auth = ctx.config.auth;

  route({
    method: 'post',
    path: '/signup',
    summary: 'Create a workspace and its owner; signs the owner in.',
    access: { kind: 'public' },
    body: signupBodySchema,
    errors: [409, 429],
    before: [limitAttempts(ctx.limits.signup, (req) => req.ip ?? 'unknown', 'sign-up')],
    success: { status: 201, description: 'Signed in as the new workspace owner.', schema: sessionSchema },
    handler: async ({ body }, req, res) => {
      const { workspaceName, name, email, password } = body;
      if (await User.findOne({ where: { email } })) {
        throw AppError.conflict(
          'email_taken',
          'An account with this e-mail already exists. Sign in instead, or reset the password.',
          'email',
        );
      }
      const passwordHash = await ctx.passwords.hash(password);
      try {
        const { user, workspace, refreshToken, sessionId } = await ctx.sequelize.transaction(async (transaction) => {
          const user = await User.create({ email, name, passwordHash }, { transaction });
          const workspace = await Workspace.create({ name: workspaceName }, { transaction });
          await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' }, { transaction });
          await recordAudit(
            {
              workspaceId: workspace.id,
              actorId: user.id,
              action: 'workspace.created',
              targetType: 'workspace',
              targetId: workspace.id,
              targetLabel: workspace.name,
            },
            transaction,
          );
          const started = await ctx.sessions.start(user.id, req.get('user-agent'), transaction);
          return { user, workspace, ...started };
        });
        setRefreshCookie(res, refreshToken, auth);
        return await sessionBody(ctx, user, sessionId, workspace);
      } catch (err) {
        if (err instanceof UniqueConstraintError)
          throw AppError.conflict('email_taken', 'An account with this e-mail already exists.', 'email');
        throw err;
      }
    },
  });

  route({
    method: 'post',
    path: '/signin',
    summary: 'Sign in with e-mail and password.',
    access: { kind: 'public' },
    body: signinBodySchema,
    errors: [429],
    before: [limitAttempts(ctx.limits.signin, ipAndEmail, 'sign-in')],
    success: { status: 200, description: 'Signed in; the refresh token is set as an httpOnly cookie.', schema: sessionSchema },
    handler: async ({ body }, req, res) => {
      const { email, password } = body;
      const user = await User.findOne({ where: { email } });
      if (!(await ctx.passwords.matches(password, user?.passwordHash ?? null)) || !user) {
        throw AppError.unauthorized('The e-mail or the password is not right.', 'invalid_credentials');
      }
      const { sessionId, refreshToken } = await ctx.sessions.start(user.id, req.get('user-agent'));
      setRefreshCookie(res, refreshToken, auth);
      return sessionBody(ctx, user, sessionId);
    },
  });

  route({
    method: 'post',
    path: '/refresh',
    summary: 'Exchange the refresh cookie for a new access token (the cookie rotates).',
    access: { kind: 'public' },
    success: { status: 200, description: 'A fresh access token.', schema: sessionSchema },
    handler: async (_input, req, res) => {
      const presented = readRefreshCookie(req);
      if (!presented) throw AppError.unauthorized('Not signed in.', 'not_signed_in');
      try {
        const { user, sessionId, refreshToken } = await ctx.sessions.rotate(presented);
        setRefreshCookie(res, refreshToken, auth);
        return await sessionBody(ctx, user, sessionId);
      } catch (err) {
        if (err instanceof AppError && err.status === 401) clearRefreshCookie(res, auth);
        throw err;
      }
    },
  });

  route({
    method: 'post',
    path: '/signout',
    summary: 'End this sign-in on every device holding it.',
    access: { kind: 'optional-user' },
    success: { status: 204, description: 'Signed out.' },
    handler: async ({ auth: caller }, req, res) => {
      const presented = readRefreshCookie(req);
      if (presented) await ctx.sessions.revokeByToken(presented);
      if (caller) await ctx.sessions.revoke(caller.sessionId, 'signed_out');
      clearRefreshCookie(res, auth);
      return undefined;
    },
  });

  route({
    method: 'post',
    path: '/password-reset',
    summary: 'E-mail a password-reset link. Answers the same whether or not the address has an account.',
    access: { kind: 'public' },
    body: passwordResetBodySchema,
    errors: [429],
    before: [limitAttempts(ctx.limits.passwordReset, ipAndEmail, 'password-reset')],
    success: { status: 202, description: 'If the address has an account, a link is on its way.', schema: messageSchema },
    handler: async ({ body }) => {
      const { email } = body;
      // Not awaited: the answer takes the same time whether or not the address exists.
      void sendPasswordReset(ctx, email).catch((err) => ctx.logger.warn({ err: String(err) }, 'password-reset mail not sent'));
      return { message: 'If an account uses this address, we have sent it a link to choose a new password.' };
    },
  });

  route({
    method: 'post',
    path: '/password-reset/confirm',
    summary: 'Set a new password with the link token; ends every sign-in of the account.',
    access: { kind: 'public' },
    body: passwordResetConfirmBodySchema,
    errors: [410],
    success: { status: 200, description: 'Password changed.', schema: messageSchema },
    handler: async ({ body }) => {
      const { token, password } = body;
      const passwordHash = await ctx.passwords.hash(password);
      await ctx.sequelize.transaction(async (transaction) => {
        const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
        if (!reset || reset.usedAt || reset.expiresAt.getTime() <= Date.now()) {
          throw AppError.gone('token_invalid', 'This reset link has expired or was already used. Ask for a new one.');
        }
        await reset.update({ usedAt: new Date() }, { transaction });
        await User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
        await ctx.sessions.revokeAllOf(reset.userId, 'password_reset', transaction);
      });
      return { message: 'Your password has been changed. Sign in with the new one.' };
    },
  });

  return router;
}

async function sendPasswordReset(ctx: AppContext, email: string): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const { token, hash } = newSecureToken();
  const minutes = ctx.config.auth.passwordResetMinutes;
  await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + minutes * 60_000), usedAt: null });
  const url = `${ctx.config.publicUrl}/reset-password?token=${token}`;
  await ctx.mailer.send(passwordResetMail({ to: user.email, name: user.name, url, minutes }));
}
