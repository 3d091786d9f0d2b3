import { Router } from 'express';
import { z } from 'zod';
import { canAssignRole, changeRoleBodySchema, idSchema, memberSchema } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Membership, User } from '../models/init-models';

const memberParams = z.object({ memberId: idSchema });

/** Members of a workspace: list, change role, remove. The last owner stays. */
export function memberRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  route({
    method: 'get',
    path: '/members',
    summary: 'List the members of the workspace.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Members, oldest first.', schema: z.array(memberSchema) },
    handler: async (_input, req) => {
      const { workspaceId } = membershipOf(req);
      const rows = await Membership.findAll({
        where: { workspaceId },
        include: [{ model: User, as: 'user', required: true }],
        order: [['createdAt', 'ASC']],
      });
      return rows.map((m) => m.toMemberDto());
    },
  });

  route({
    method: 'patch',
    path: '/members/:memberId',
    summary: 'Change a member’s role.',
    access: { kind: 'workspace', permission: 'members.manage' },
    params: memberParams,
    body: changeRoleBodySchema,
    errors: [409],
    success: { status: 200, description: 'The member with the new role.', schema: memberSchema },
    handler: async ({ params, body, auth }, req) => {
      const actor = membershipOf(req);
      return ctx.sequelize.transaction(async (transaction) => {
        const member = await lockedMember(actor.workspaceId, params.memberId, transaction);
        if (member.role === body.role) return member.toMemberDto();
        if (!canAssignRole(actor.role, body.role) || (member.role === 'owner' && actor.role !== 'owner')) {
          throw AppError.forbidden('Only an owner can give or take away the owner role.');
        }
        if (member.role === 'owner') await assertNotLastOwner(actor.workspaceId, transaction, 'demoted');
        const before = member.role;
        await member.update({ role: body.role }, { transaction });
        await recordAudit(
          {
            workspaceId: actor.workspaceId,
            actorId: auth!.user.id,
            action: 'member.role_changed',
            targetType: 'member',
            targetId: member.id,
            targetLabel: member.user!.email,
            details: { from: before, to: body.role },
          },
          transaction,
        );
        return member.toMemberDto();
      });
    },
  });

  route({
    method: 'delete',
    path: '/members/:memberId',
    summary: 'Remove a member from the workspace.',
    access: { kind: 'workspace', permission: 'members.manage' },
    params: memberParams,
    errors: [409],
    success: { status: 204, description: 'Removed.' },
    handler: async ({ params, auth }, req) => {
      const actor = membershipOf(req);
      await ctx.sequelize.transaction(async (transaction) => {
        const member = await lockedMember(actor.workspaceId, params.memberId, transaction);
        if (member.role === 'owner' && actor.role !== 'owner') throw AppError.forbidden('Only an owner can remove an owner.');
        if (member.role === 'owner') await assertNotLastOwner(actor.workspaceId, transaction, 'removed');
        await member.destroy({ transaction });
        await recordAudit(
          {
            workspaceId: actor.workspaceId,
            actorId: auth!.user.id,
            action: 'member.removed',
            targetType: 'member',
            targetId: member.id,
            targetLabel: member.user!.email,
            details: { role: member.role, name: member.user!.name },
          },
          transaction,
        );
      });
      return undefined;
    },
  });
}

async function lockedMember(workspaceId: string, memberId: string, transaction: import('sequelize').Transaction) {
  const member = await Membership.findOne({ where: { id: memberId, workspaceId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!member) throw AppError.notFound('Member');
  member.user = (await User.findByPk(member.userId, { transaction }))!;
  return member;
}

/** Locks the owner rows so two concurrent demotions cannot both pass. */
async function assertNotLastOwner(workspaceId: string, transaction: import('sequelize').Transaction, verb: string): Promise<void> {
  const owners = await Membership.findAll({ where: { workspaceId, role: 'owner' }, transaction, lock: transaction.LOCK.UPDATE });
  if (owners.length <= 1) {
    throw AppError.conflict('last_owner', `The last owner cannot be ${verb}. Make another member an owner first.`);
  }
}
