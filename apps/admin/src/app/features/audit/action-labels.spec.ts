import { AUDIT_ACTIONS } from '@tumblewise/shared';
import { actionLabel, BILLING_ACTION_PREFIX, FILTER_ACTIONS } from './action-labels';

describe('actionLabel', () => {
  it('labels the billing, suspension, material and design actions', () => {
    expect(actionLabel('billing.seats_changed')).toBe('Seats changed');
    expect(actionLabel('billing.invoice.payment_failed')).toBe('Payment failed');
    expect(actionLabel('workspace.suspended')).toBe('Workspace suspended');
    expect(actionLabel('material.deleted')).toBe('Material deleted');
    expect(actionLabel('review.changes_requested')).toBe('Changes requested');
    expect(actionLabel('project.archived')).toBe('Project archived');
    expect(actionLabel('mesh.deleted')).toBe('Mesh deleted');
  });

  it('writes an unknown action from its name instead of showing the raw key', () => {
    expect(actionLabel('billing.coupon_applied')).toBe('Billing: coupon applied');
    expect(actionLabel('single')).toBe('single');
    expect(actionLabel(BILLING_ACTION_PREFIX)).toBe('Any billing event');
  });

  it('offers every shared action in the filter, once', () => {
    for (const action of AUDIT_ACTIONS) expect(FILTER_ACTIONS).toContain(action);
    expect(new Set(FILTER_ACTIONS).size).toBe(FILTER_ACTIONS.length);
  });
});
