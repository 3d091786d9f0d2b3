import { AUDIT_ACTIONS } from '@tumblewise/shared';

/** How each audit action is written on screen; unknown actions show their raw name. */
export const ACTION_LABELS: Record<(typeof AUDIT_ACTIONS)[number], string> = {
  'workspace.created': 'Workspace created',
  'member.role_changed': 'Role changed',
  'member.removed': 'Member removed',
  'invitation.created': 'Invitation sent',
  'invitation.resent': 'Invitation re-sent',
  'invitation.revoked': 'Invitation revoked',
  'invitation.accepted': 'Invitation accepted',
  'invitation.delivery_failed': 'Invitation e-mail failed',
};

/** The label of an action name. */
export function actionLabel(action: string): string {
  return (ACTION_LABELS as Record<string, string>)[action] ?? action;
}
