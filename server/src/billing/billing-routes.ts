import { Router } from 'express';
import { z } from 'zod';
import {
  billingSchema,
  changeSeatsBodySchema,
  invoiceSchema,
  paymentMethodBodySchema,
  startSubscriptionBodySchema,
} from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Workspace } from '../models/init-models';
import { billingView } from './billing-view';
import { planCatalogue } from './plan-catalogue';
import { seatUsage } from './seats';

/** Seats and subscription of a workspace, through the payment provider. Owners change; admins read. */
export function billingRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const provider = ctx.payment;
  const workspaceOf = async (req: Parameters<typeof membershipOf>[0]) => (await Workspace.findByPk(membershipOf(req).workspaceId))!;
  const audit = (w: Workspace, actorId: string, action: string, details: Record<string, unknown>) =>
    recordAudit({
      workspaceId: w.id,
      actorId,
      action,
      targetType: 'subscription',
      targetId: w.subscriptionId,
      targetLabel: w.name,
      details,
    });

  route({
    method: 'get',
    path: '/billing',
    summary: 'Plan, seats used and bought, subscription, payment method and workspace state.',
    access: { kind: 'workspace', permission: 'billing.read' },
    success: { status: 200, description: 'Billing.', schema: billingSchema },
    handler: async (_i, req) => billingView(ctx, await workspaceOf(req)),
  });

  route({
    method: 'post',
    path: '/billing/subscription',
    summary: 'Start the subscription: a customer with the tokenised card and a subscription with quantity = seats (trial first).',
    access: { kind: 'workspace', permission: 'billing.manage' },
    body: startSubscriptionBodySchema,
    allowWhenLocked: true,
    errors: [402, 409, 503],
    success: { status: 200, description: 'Billing after the change.', schema: billingSchema },
    handler: async ({ body, auth }, req) => {
      const workspace = await workspaceOf(req);
      if (workspace.subscriptionId && workspace.subscriptionStatus !== 'canceled')
        throw AppError.conflict('already_subscribed', 'This workspace already has a subscription; change its seats instead.');
      const plan = planCatalogue(ctx.config.billing).find((p) => p.id === (body.planId ?? 'bench-monthly'));
      if (!plan) throw AppError.badRequest('planId is not a plan of the catalogue.', 'planId');
      const usage = await seatUsage(workspace, ctx.config.billing.evaluationSeats);
      if (body.seats < usage.members + usage.pendingInvitations) {
        throw AppError.conflict(
          'seats_in_use',
          `Buy at least ${usage.members + usage.pendingInvitations} seats: ${usage.members} members and ${usage.pendingInvitations} pending invitations hold one each.`,
          'seats',
        );
      }
      const providerPlan = await provider.ensurePlan(plan);
      // Declined cards fail here (402) before anything is stored.
      const { customerId, card } = workspace.customerId
        ? { customerId: workspace.customerId, card: await provider.replaceCard(workspace.customerId, body.cardToken) }
        : await provider.createCustomer(workspace, body.cardToken);
      const sub = await provider.createSubscription(customerId, providerPlan, body.seats, plan.trialDays, workspace.id);
      await workspace.update({
        planId: plan.id,
        seats: body.seats,
        customerId,
        subscriptionId: sub.subscriptionId,
        subscriptionItemId: sub.itemId,
        subscriptionStatus: sub.status,
        cancelAtPeriodEnd: sub.cancelAtPeriodEnd,
        currentPeriodEnd: sub.currentPeriodEnd,
        trialEndsAt: sub.trialEndsAt,
        cardBrand: card.brand,
        cardLast4: card.last4,
        cardExpMonth: card.expMonth,
        cardExpYear: card.expYear,
        ...(workspace.state === 'read_only' ? { state: 'active' as const } : {}),
      });
      await audit(workspace, auth!.user.id, 'billing.subscribed', { plan: plan.id, seats: body.seats });
      return billingView(ctx, workspace);
    },
  });

  route({
    method: 'patch',
    path: '/billing/subscription',
    summary: 'Change the number of seats (prorated on the next invoice); never below members + pending invitations.',
    access: { kind: 'workspace', permission: 'billing.manage' },
    body: changeSeatsBodySchema,
    allowWhenLocked: true,
    errors: [409, 503],
    success: { status: 200, description: 'Billing after the change.', schema: billingSchema },
    handler: async ({ body, auth }, req) => {
      const workspace = await workspaceOf(req);
      if (!workspace.subscriptionItemId) throw AppError.conflict('no_subscription', 'Start a subscription first.');
      const usage = await seatUsage(workspace, ctx.config.billing.evaluationSeats);
      if (body.seats < usage.members + usage.pendingInvitations) {
        throw AppError.conflict(
          'seats_in_use',
          `${usage.members} members and ${usage.pendingInvitations} pending invitations hold seats: keep at least ${usage.members + usage.pendingInvitations}, or remove members or revoke invitations first.`,
          'seats',
        );
      }
      const before = workspace.seats;
      await provider.changeSeats(workspace.subscriptionItemId, body.seats);
      await workspace.update({ seats: body.seats });
      await audit(workspace, auth!.user.id, 'billing.seats_changed', { from: before, to: body.seats, prorated: true });
      return billingView(ctx, workspace);
    },
  });

  for (const [path, cancel] of [
    ['/billing/subscription/cancel', true],
    ['/billing/subscription/resume', false],
  ] as const) {
    route({
      method: 'post',
      path,
      summary: cancel ? 'Cancel at the end of the current period.' : 'Keep the subscription after all (undo a pending cancellation).',
      access: { kind: 'workspace', permission: 'billing.manage' },
      allowWhenLocked: true,
      errors: [409, 503],
      success: { status: 200, description: 'Billing after the change.', schema: billingSchema },
      handler: async ({ auth }, req) => {
        const workspace = await workspaceOf(req);
        if (!workspace.subscriptionId || workspace.subscriptionStatus === 'canceled')
          throw AppError.conflict('no_subscription', 'There is no running subscription.');
        const sub = await provider.setCancelAtPeriodEnd(workspace.subscriptionId, cancel);
        await workspace.update({ cancelAtPeriodEnd: sub.cancelAtPeriodEnd });
        await audit(workspace, auth!.user.id, cancel ? 'billing.cancel_scheduled' : 'billing.resumed', {});
        return billingView(ctx, workspace);
      },
    });
  }

  route({
    method: 'put',
    path: '/billing/payment-method',
    summary: 'Replace the card (tokenised by the card form).',
    access: { kind: 'workspace', permission: 'billing.manage' },
    body: paymentMethodBodySchema,
    allowWhenLocked: true,
    errors: [402, 409, 503],
    success: { status: 200, description: 'Billing after the change.', schema: billingSchema },
    handler: async ({ body, auth }, req) => {
      const workspace = await workspaceOf(req);
      if (!workspace.customerId) throw AppError.conflict('no_subscription', 'Start a subscription first; its form takes the card.');
      const card = await provider.replaceCard(workspace.customerId, body.cardToken);
      await workspace.update({ cardBrand: card.brand, cardLast4: card.last4, cardExpMonth: card.expMonth, cardExpYear: card.expYear });
      await audit(workspace, auth!.user.id, 'billing.card_replaced', { last4: card.last4 });
      return billingView(ctx, workspace);
    },
  });

  route({
    method: 'get',
    path: '/billing/invoices',
    summary: 'Invoices of the workspace, newest first.',
    access: { kind: 'workspace', permission: 'billing.read' },
    errors: [503],
    success: { status: 200, description: 'Invoices.', schema: z.array(invoiceSchema) },
    handler: async (_i, req) => {
      const workspace = await workspaceOf(req);
      if (!workspace.customerId) return [];
      return (await provider.listInvoices(workspace.customerId)).sort((a, b) => b.createdAt.localeCompare(a.createdAt));
    },
  });
}
