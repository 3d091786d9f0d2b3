import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { AccessTokens } from '../accounts/access-tokens';
import type { SignedInUsers } from '../accounts/signed-in-users';
import { Membership, User, Workspace } from '../models/init-models';
import { AppError } from './app-error';
import { idSchema } from '@tumblewise/shared';

/** The signed-in caller, attached to the request by `authenticate`. */
export interface RequestAuth {
  user: User;
  sessionId: string;
}

export type AuthedRequest = Request & { auth?: RequestAuth; membership?: Membership & { workspace: Workspace } };

/**
 * Reads `Authorization: Bearer …`. No header: the request goes on unsigned (routes decide).
 * A bad, expired or revoked token: 401. The session is checked against PostgreSQL through
 * `SignedInUsers`, which remembers live sign-ins and forgets them as a revocation commits, on every
 * server process.
 */
export function authenticate(tokens: AccessTokens, signedIn: SignedInUsers): RequestHandler {
  return async (req: AuthedRequest, _res: Response, next: NextFunction) => {
    const header = req.headers.authorization;
    if (!header) return next();
    const match = /^Bearer ([A-Za-z0-9_.-]+)$/.exec(header);
    if (!match) throw AppError.unauthorized('Send the access token as "Authorization: Bearer <token>".', 'token_invalid');
    const claims = tokens.verify(match[1]);
    const user = await signedIn.find(claims.sessionId, claims.userId);
    // Revoked, unknown, or its account deleted (sessions go with their user): signed out.
    if (!user) throw AppError.unauthorized('You have been signed out. Sign in again.', 'session_revoked');
    req.auth = { user, sessionId: claims.sessionId };
    next();
  };
}

/**
 * Gate of every `/workspaces/:workspaceId/…` route: the caller must be signed in (401) and a
 * member of that workspace; otherwise the workspace "does not exist" for them (404).
 */
export const workspaceGate: RequestHandler = async (req: AuthedRequest, _res, next) => {
  if (!req.auth) throw AppError.unauthorized();
  const parsed = idSchema.safeParse(req.params.workspaceId);
  if (!parsed.success) throw AppError.notFound('Workspace');
  const membership = await Membership.findOne({
    where: { workspaceId: parsed.data, userId: req.auth.user.id },
    include: [{ model: Workspace, as: 'workspace', required: true }],
  });
  if (!membership) throw AppError.notFound('Workspace');
  req.membership = membership as Membership & { workspace: Workspace };
  next();
};

/** The workspace membership of a request that passed the gate. */
export function membershipOf(req: Request): Membership & { workspace: Workspace } {
  const m = (req as AuthedRequest).membership;
  if (!m) throw new Error('membershipOf called outside a workspace route');
  return m;
}
