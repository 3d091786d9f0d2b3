import express, { Router } from 'express';
import type Stripe from 'stripe';
import { z } from 'zod';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { paymentFailedMail, receiptMail } from '../mail/messages';
import { Membership, User, Workspace } from '../models/init-models';
import { BillingEvent } from '../models/billing-event';

/**
 * `POST /billing/webhook`: provider events, signature checked on the raw body. Idempotent by event
 * id (a replay changes nothing); an event older than the last one applied to the workspace is
 * recorded but never moves the state back.
 */
export function billingWebhookRoutes(ctx: AppContext): Router {
  const router = Router();
  router.use('/billing/webhook', express.raw({ type: '*/*', limit: '1mb' }));
  routeGroup(
    router,
    ctx.catalogue,
    '',
  )({
    method: 'post',
    path: '/billing/webhook',
    summary: 'Payment-provider events (signature checked; idempotent by event id).',
    access: { kind: 'public' },
    success: {
      status: 200,
      description: 'Received.',
      schema: z.object({ received: z.literal(true), duplicate: z.boolean(), applied: z.boolean() }),
    },
    handler: async (_i, req) => {
      const signature = req.get('stripe-signature');
      if (!signature || !Buffer.isBuffer(req.body)) throw new AppError(400, 'bad_signature', 'The event has no valid signature header.');
      let event: Stripe.Event;
      try {
        event = ctx.payment.client.webhooks.constructEvent(req.body, signature, ctx.config.payment.webhookSecret);
      } catch {
        throw new AppError(400, 'bad_signature', 'The event signature does not match.');
      }
      return applyEvent(ctx, event);
    },
  });
  return router;
}

const customerOf = (obj: { customer?: unknown }) =>
  typeof obj.customer === 'string' ? obj.customer : ((obj.customer as { id?: string } | null)?.id ?? null);

async function applyEvent(ctx: AppContext, event: Stripe.Event): Promise<{ received: true; duplicate: boolean; applied: boolean }> {
  const obj = event.data.object as unknown as Record<string, unknown> & { customer?: unknown; metadata?: Record<string, string> };
  const created = new Date(event.created * 1000);
  const notices: (() => Promise<void>)[] = [];
  const outcome = await ctx.sequelize.transaction(async (transaction) => {
    const customer = customerOf(obj);
    const workspace = customer
      ? await Workspace.findOne({ where: { customerId: customer }, transaction, lock: transaction.LOCK.UPDATE })
      : null;
    const [, inserted] = await BillingEvent.findOrCreate({
      where: { id: event.id },
      defaults: { id: event.id, type: event.type, workspaceId: workspace?.id ?? null, providerCreatedAt: created, applied: false },
      transaction,
    });
    if (!inserted) return { duplicate: true, applied: false };
    if (!workspace) return { duplicate: false, applied: false };
    if (workspace.billingEventAt && created < workspace.billingEventAt) return { duplicate: false, applied: false };
    const unlessSuspended = (state: Workspace['state']) => (workspace.state === 'suspended' ? 'suspended' : state);
    switch (event.type) {
      case 'customer.subscription.created':
      case 'customer.subscription.updated': {
        const sub = obj as unknown as Stripe.Subscription;
        const periodEnd = (sub as unknown as { current_period_end?: number }).current_period_end;
        await workspace.update(
          {
            subscriptionStatus: sub.status,
            cancelAtPeriodEnd: !!sub.cancel_at_period_end,
            seats: sub.items?.data?.[0]?.quantity ?? workspace.seats,
            ...(periodEnd ? { currentPeriodEnd: new Date(periodEnd * 1000) } : {}),
          },
          { transaction },
        );
        break;
      }
      case 'customer.subscription.deleted':
        await workspace.update({ subscriptionStatus: 'canceled', state: unlessSuspended('read_only') }, { transaction });
        break;
      case 'invoice.paid': {
        await workspace.update(
          {
            pastDueSince: null,
            state: unlessSuspended('active'),
            ...(workspace.subscriptionStatus === 'past_due' ? { subscriptionStatus: 'active' } : {}),
          },
          { transaction },
        );
        const inv = obj as unknown as Stripe.Invoice;
        notices.push(() =>
          mailOwners(ctx, workspace, (to) =>
            receiptMail({
              to,
              workspaceName: workspace.name,
              amount: inv.amount_paid,
              currency: inv.currency,
              number: inv.number ?? null,
              url: `${ctx.config.publicUrl}/admin/invoices`,
            }),
          ),
        );
        break;
      }
      case 'invoice.payment_failed':
        await workspace.update(
          {
            state: unlessSuspended(workspace.state === 'read_only' ? 'read_only' : 'past_due'),
            pastDueSince: workspace.pastDueSince ?? created,
            subscriptionStatus: 'past_due',
          },
          { transaction },
        );
        notices.push(() =>
          mailOwners(ctx, workspace, (to) =>
            paymentFailedMail({
              to,
              workspaceName: workspace.name,
              readOnlyFrom: workspace.readOnlyFrom(),
              url: `${ctx.config.publicUrl}/admin/subscription`,
            }),
          ),
        );
        break;
      default:
        return { duplicate: false, applied: false };
    }
    await workspace.update({ billingEventAt: created }, { transaction });
    await BillingEvent.update({ applied: true }, { where: { id: event.id }, transaction });
    await recordAudit(
      {
        workspaceId: workspace.id,
        actorId: null,
        action: `billing.${event.type}`,
        targetType: 'subscription',
        targetId: workspace.subscriptionId,
        targetLabel: workspace.name,
        details: { event: event.id },
      },
      transaction,
    );
    return { duplicate: false, applied: true };
  });
  for (const notice of notices) await notice().catch((err) => ctx.logger.warn({ err: String(err) }, 'billing e-mail not sent'));
  return { received: true, ...outcome };
}

async function mailOwners(
  ctx: AppContext,
  workspace: Workspace,
  make: (to: string) => import('../mail/mailer').OutgoingMail,
): Promise<void> {
  const owners = await Membership.findAll({
    where: { workspaceId: workspace.id, role: 'owner' },
    include: [{ model: User, as: 'user', required: true }],
  });
  for (const o of owners) await ctx.mailer.send(make(o.user!.email));
}
