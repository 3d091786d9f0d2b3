import type { Session } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { Membership, Workspace, type User } from '../models/init-models';

/** The memberships of a user with their workspaces, oldest first. */
export async function membershipsOf(userId: string): Promise<Session['memberships']> {
  const rows = await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: 'workspace', required: true }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((m) => ({ workspace: m.workspace!.toDto(), role: m.role }));
}

/** Body answered by sign-up, sign-in, refresh and invitation acceptance. */
export async function sessionBody(ctx: AppContext, user: User, sessionId: string, workspace?: Workspace): Promise<Session> {
  return {
    accessToken: ctx.tokens.sign({ userId: user.id, sessionId }),
    expiresIn: ctx.tokens.lifetimeSeconds,
    user: user.toDto(),
    memberships: await membershipsOf(user.id),
    ...(workspace ? { workspace: workspace.toDto() } : {}),
  };
}
