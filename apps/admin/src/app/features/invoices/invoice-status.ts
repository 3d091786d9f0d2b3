import type { Invoice } from '@tumblewise/shared';

/** How each invoice status is written on screen. */
export const INVOICE_STATUS_LABELS: Record<Invoice['status'], string> = {
  draft: 'Draft',
  open: 'Due',
  paid: 'Paid',
  void: 'Void',
  uncollectible: 'Uncollectible',
};
