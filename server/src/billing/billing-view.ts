import type { Billing } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import type { Workspace } from '../models/init-models';
import { planCatalogue } from './plan-catalogue';
import { seatUsage } from './seats';

/** The billing page of a workspace from our own records (kept current by provider responses and events). */
export async function billingView(ctx: AppContext, workspace: Workspace): Promise<Billing> {
  const plans = planCatalogue(ctx.config.billing);
  return {
    plans,
    plan: plans.find((p) => p.id === workspace.planId) ?? null,
    seats: await seatUsage(workspace, ctx.config.billing.evaluationSeats),
    subscription: workspace.subscriptionId
      ? {
          status: (workspace.subscriptionStatus ?? 'active') as NonNullable<Billing['subscription']>['status'],
          cancelAtPeriodEnd: workspace.cancelAtPeriodEnd,
          currentPeriodEnd: workspace.currentPeriodEnd?.toISOString() ?? null,
          trialEndsAt: workspace.trialEndsAt?.toISOString() ?? null,
        }
      : null,
    paymentMethod: workspace.cardLast4
      ? {
          brand: workspace.cardBrand ?? 'card',
          last4: workspace.cardLast4,
          expMonth: workspace.cardExpMonth ?? null,
          expYear: workspace.cardExpYear ?? null,
        }
      : null,
    workspaceState: workspace.effectiveState(),
    pastDueSince: workspace.pastDueSince?.toISOString() ?? null,
    readOnlyFrom: workspace.readOnlyFrom()?.toISOString() ?? null,
  };
}
