import { Op, type Transaction } from 'sequelize';
import type { Billing } from '@tumblewise/shared';
import { AppError } from '../http/app-error';
import { Invitation, Membership, type Workspace } from '../models/init-models';

/** Seats bought (or the evaluation allowance before a subscription) against members and pending invitations. */
export async function seatUsage(workspace: Workspace, evaluationSeats: number, transaction?: Transaction): Promise<Billing['seats']> {
  const [members, pendingInvitations] = await Promise.all([
    Membership.count({ where: { workspaceId: workspace.id }, transaction }),
    Invitation.count({ where: { workspaceId: workspace.id, status: 'pending', expiresAt: { [Op.gt]: new Date() } }, transaction }),
  ]);
  const evaluationAllowance = !workspace.subscriptionId;
  const bought = evaluationAllowance ? evaluationSeats : (workspace.seats ?? 0);
  return { bought, members, pendingInvitations, available: Math.max(0, bought - members - pendingInvitations), evaluationAllowance };
}

/**
 * Refuses (409 seat_limit) when `adding` more seat holders would exceed the seats. `counted`
 * leaves out a pending invitation that is being turned into a member.
 */
export async function assertSeatsFor(
  workspace: Workspace,
  evaluationSeats: number,
  adding: number,
  options: { acceptingPending?: boolean; transaction?: Transaction } = {},
): Promise<void> {
  const usage = await seatUsage(workspace, evaluationSeats, options.transaction);
  const held = usage.members + usage.pendingInvitations - (options.acceptingPending ? 1 : 0);
  if (held + adding > usage.bought) {
    const what = usage.evaluationAllowance ? `the ${usage.bought} seats of the evaluation allowance` : `its ${usage.bought} seats`;
    const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
    throw AppError.conflict(
      'seat_limit',
      `This workspace has used ${what} (${count(usage.members, 'member', 'members')}, ${count(usage.pendingInvitations, 'pending invitation', 'pending invitations')}). An owner can buy more seats under Subscription in the admin app, or revoke a pending invitation.`,
    );
  }
}
