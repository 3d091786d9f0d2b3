import type { Invitation } from '@tumblewise/shared';

/** How each invitation status is written on screen. */
export const STATUS_LABELS: Record<Invitation['status'], string> = {
  pending: 'Pending',
  accepted: 'Accepted',
  revoked: 'Revoked',
  expired: 'Expired',
};

/** "sent" or "not sent (reason)". */
export function deliveryLabel(invitation: Invitation): string {
  if (invitation.delivery === 'sent') return 'sent';
  return invitation.deliveryError ? `not sent (${invitation.deliveryError})` : 'not sent';
}

/** An invitation can be re-sent while it is pending or after it expired. */
export function mayResend(invitation: Invitation): boolean {
  return invitation.status === 'pending' || invitation.status === 'expired';
}

/** Only a pending invitation can be revoked. */
export function mayRevoke(invitation: Invitation): boolean {
  return invitation.status === 'pending';
}
