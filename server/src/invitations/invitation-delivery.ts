import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { invitationMail } from '../mail/messages';
import { Invitation, User, Workspace } from '../models/init-models';

/**
 * Sends the invitation e-mail with a freshly issued token. A mail server that is down leaves the
 * invitation in place as "not sent" with the reason; re-sending later works.
 */
export async function deliverInvitation(ctx: AppContext, invitation: Invitation, token: string, actorId: string | null): Promise<void> {
  const workspace = await Workspace.findByPk(invitation.workspaceId);
  const inviter = invitation.invitedById ? await User.findByPk(invitation.invitedById) : null;
  const url = `${ctx.config.publicUrl}/invitations/accept?token=${token}`;
  try {
    await ctx.mailer.send(
      invitationMail({
        to: invitation.email,
        workspaceName: workspace?.name ?? 'a workspace',
        inviterName: inviter?.name ?? null,
        role: invitation.role,
        url,
        days: ctx.config.auth.invitationDays,
      }),
    );
    await invitation.update({ delivery: 'sent', deliveryError: null, lastSentAt: new Date() });
  } catch (err) {
    const reason = describeMailError(err);
    ctx.logger.warn({ invitationId: invitation.id, reason }, 'invitation e-mail not sent');
    await invitation.update({ delivery: 'not_sent', deliveryError: reason });
    await recordAudit({
      workspaceId: invitation.workspaceId,
      actorId,
      action: 'invitation.delivery_failed',
      targetType: 'invitation',
      targetId: invitation.id,
      targetLabel: invitation.email,
      details: { reason },
    });
  }
}

function describeMailError(err: unknown): string {
  const e = err as { code?: string; message?: string };
  if (e?.code === 'ECONNREFUSED' || e?.code === 'ESOCKET' || e?.code === 'ECONNECTION')
    return 'The mail server is not reachable; re-send once it is back.';
  if (e?.code === 'ETIMEDOUT') return 'The mail server did not answer in time; re-send later.';
  return `The mail server refused the message (${(e?.message ?? 'unknown error').slice(0, 200)}).`;
}
