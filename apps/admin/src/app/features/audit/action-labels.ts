import { AUDIT_ACTIONS } from '@tumblewise/shared';

/** The audit filter value that selects every billing event (the server filters by this prefix). */
export const BILLING_ACTION_PREFIX = 'billing.';

/** How each audit action is written on screen; unknown actions are written from their name. */
export const ACTION_LABELS: Record<(typeof AUDIT_ACTIONS)[number], string> & Record<string, string> = {
  'workspace.created': 'Workspace created',
  'member.role_changed': 'Role changed',
  'member.removed': 'Member removed',
  'invitation.created': 'Invitation sent',
  'invitation.resent': 'Invitation re-sent',
  'invitation.revoked': 'Invitation revoked',
  'invitation.accepted': 'Invitation accepted',
  'invitation.delivery_failed': 'Invitation e-mail failed',
  'billing.subscribed': 'Seats bought',
  'billing.seats_changed': 'Seats changed',
  'billing.cancel_scheduled': 'Subscription set to end',
  'billing.resumed': 'Subscription resumed',
  'billing.card_replaced': 'Card replaced',
  'billing.customer.subscription.created': 'Subscription confirmed by the provider',
  'billing.customer.subscription.updated': 'Subscription updated by the provider',
  'billing.customer.subscription.deleted': 'Subscription ended',
  'billing.invoice.paid': 'Invoice paid',
  'billing.invoice.payment_failed': 'Payment failed',
  'workspace.suspended': 'Workspace suspended',
  'workspace.restored': 'Workspace restored',
  'workspace.settings_changed': 'Settings changed',
  'material.created': 'Material added',
  'material.updated': 'Material changed',
  'material.deleted': 'Material deleted',
  'variant.saved': 'Variant saved',
  'review.requested': 'Sign-off requested',
  'review.approved': 'Variant approved',
  'review.changes_requested': 'Changes requested',
  'review.commented': 'Sign-off comment',
  'mesh.uploaded': 'Mesh uploaded',
  'mesh.deleted': 'Mesh deleted',
  'measurements.imported': 'Measurements imported',
  'measurements.removed': 'Measurements removed',
  'project.archived': 'Project archived',
  'project.restored': 'Project restored',
};

/** The actions offered in the filter, in the order of the table above. */
export const FILTER_ACTIONS: readonly string[] = [...new Set([...AUDIT_ACTIONS, ...Object.keys(ACTION_LABELS)])];

/**
 * The label of an action name. An action without a label of its own is written from its name:
 * `billing.coupon_applied` → "Billing: coupon applied".
 */
export function actionLabel(action: string): string {
  if (action === BILLING_ACTION_PREFIX) return 'Any billing event';
  const known = ACTION_LABELS[action];
  if (known) return known;
  const [area, ...rest] = action.split('.');
  if (!area || !rest.length) return action;
  const subject = area.charAt(0).toUpperCase() + area.slice(1);
  return `${subject}: ${rest.join(' ').replace(/_/g, ' ')}`;
}
