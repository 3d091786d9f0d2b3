import type { Billing } from '@tumblewise/shared';

type SubscriptionStatus = NonNullable<Billing['subscription']>['status'];

/** How each subscription status is written on screen. */
export const SUBSCRIPTION_STATUS_LABELS: Record<SubscriptionStatus, string> = {
  trialing: 'Trial',
  active: 'Active',
  past_due: 'Payment overdue',
  canceled: 'Cancelled',
  unpaid: 'Unpaid',
  incomplete: 'Incomplete',
};

/** The card brand as the provider names it, with a capital first letter. */
export function cardBrandLabel(brand: string): string {
  return brand ? brand.charAt(0).toUpperCase() + brand.slice(1) : 'Card';
}
