import Stripe from 'stripe';
import type { Invoice, Plan } from '@tumblewise/shared';
import type { Config } from '../config/config';
import { AppError } from '../http/app-error';

export interface CardSummary {
  brand: string;
  last4: string;
  expMonth: number | null;
  expYear: number | null;
}
export interface SubscriptionSummary {
  subscriptionId: string;
  itemId: string;
  status: string;
  currentPeriodEnd: Date | null;
  trialEndsAt: Date | null;
  cancelAtPeriodEnd: boolean;
  quantity: number;
}

/**
 * The payment provider through its official SDK. Locally it points at the fake started by infra/;
 * in production PAYMENT_API_URL is the provider's own address and nothing else changes.
 */
export class PaymentProvider {
  readonly client: Stripe;

  constructor(config: Config['payment']) {
    const url = new URL(config.apiUrl);
    this.client = new Stripe(config.secretKey, {
      host: url.hostname,
      port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
      protocol: url.protocol.replace(':', '') as 'http' | 'https',
      maxNetworkRetries: 0,
      timeout: 5000,
    });
  }

  /** True when the provider answers an authenticated request. */
  async isReachable(): Promise<boolean> {
    try {
      await this.client.customers.list({ limit: 1 });
      return true;
    } catch {
      return false;
    }
  }

  /** The provider-side plan of a catalogue plan, created on first use. */
  async ensurePlan(plan: Plan): Promise<string> {
    const id = `plan_${plan.id.replace(/-/g, '_')}`;
    return this.call(async () => {
      try {
        await this.client.plans.retrieve(id);
      } catch (err) {
        if ((err as { statusCode?: number }).statusCode !== 404) throw err;
        const product = await this.client.products.create({ name: `Tumblewise ${plan.name}` });
        await this.client.plans.create({
          id,
          product: product.id,
          amount: plan.pricePerSeatMonthly,
          currency: plan.currency,
          interval: 'month',
        });
      }
      return id;
    });
  }

  /** A customer for the workspace with the tokenised card as its default source (402 when declined). */
  async createCustomer(workspace: { id: string; name: string }, cardToken: string): Promise<{ customerId: string; card: CardSummary }> {
    return this.call(async () => {
      const customer = await this.client.customers.create({
        name: workspace.name,
        source: cardToken,
        metadata: { workspaceId: workspace.id },
      });
      return { customerId: customer.id, card: await this.defaultCard(customer.id, customer.default_source as string | null) };
    });
  }

  /** Replaces the customer's card (402 when declined; the old card stays). */
  async replaceCard(customerId: string, cardToken: string): Promise<CardSummary> {
    return this.call(async () => {
      const source = await this.client.customers.createSource(customerId, { source: cardToken });
      await this.client.customers.update(customerId, { default_source: source.id });
      return this.defaultCard(customerId, source.id);
    });
  }

  async createSubscription(
    customerId: string,
    planId: string,
    seats: number,
    trialDays: number,
    workspaceId: string,
  ): Promise<SubscriptionSummary> {
    return this.call(async () =>
      summary(
        await this.client.subscriptions.create({
          customer: customerId,
          items: [{ plan: planId, quantity: seats }],
          trial_period_days: trialDays || undefined,
          metadata: { workspaceId },
        } as Stripe.SubscriptionCreateParams),
        trialDays,
      ),
    );
  }

  /** Changes the seat count on the subscription item; the provider prorates the difference. */
  async changeSeats(itemId: string, seats: number): Promise<void> {
    await this.call(() => this.client.subscriptionItems.update(itemId, { quantity: seats, proration_behavior: 'create_prorations' }));
  }

  async setCancelAtPeriodEnd(subscriptionId: string, cancel: boolean): Promise<SubscriptionSummary> {
    return this.call(async () => summary(await this.client.subscriptions.update(subscriptionId, { cancel_at_period_end: cancel }), 0));
  }

  async listInvoices(customerId: string): Promise<Invoice[]> {
    return this.call(async () => {
      const list = await this.client.invoices.list({ customer: customerId, limit: 100 });
      return list.data.map((i) => ({
        id: i.id ?? '',
        number: i.number ?? null,
        createdAt: new Date(i.created * 1000).toISOString(),
        amountDue: i.amount_due,
        amountPaid: i.amount_paid,
        currency: i.currency,
        status: (i.status ?? 'draft') as Invoice['status'],
        description: i.description ?? 'Subscription',
        documentUrl: i.hosted_invoice_url ?? i.invoice_pdf ?? null,
      }));
    });
  }

  private async defaultCard(customerId: string, sourceId: string | null): Promise<CardSummary> {
    if (!sourceId) return { brand: 'card', last4: '????', expMonth: null, expYear: null };
    const card = (await this.client.customers.retrieveSource(customerId, sourceId)) as Stripe.Card;
    return { brand: card.brand ?? 'card', last4: card.last4 ?? '????', expMonth: card.exp_month ?? null, expYear: card.exp_year ?? null };
  }

  /** Provider errors as ours: a declined card is 402 with the provider's words; an outage is 503. */
  private async call<T>(fn: () => Promise<T>): Promise<T> {
    try {
      return await fn();
    } catch (err) {
      const e = err as { type?: string; statusCode?: number; message?: string; code?: string };
      if (e.type === 'StripeCardError')
        throw new AppError(
          402,
          'card_declined',
          `${e.message ?? 'The card was declined.'} Nothing was changed; try another card.`,
          'cardToken',
        );
      if (e.type === 'StripeConnectionError' || e.code === 'ECONNREFUSED') {
        throw new AppError(
          503,
          'payment_unavailable',
          'The payment provider is not reachable right now. Nothing was changed; try again in a moment.',
          undefined,
          { 'Retry-After': '10' },
        );
      }
      if (e.statusCode === 404)
        throw new AppError(
          409,
          'payment_record_missing',
          'The payment provider does not know this workspace’s subscription (the local fake forgets on restart). Start the subscription again.',
        );
      throw err;
    }
  }
}

function summary(sub: Stripe.Subscription, requestedTrialDays: number): SubscriptionSummary {
  const item = sub.items.data[0];
  const periodEnd =
    (sub as unknown as { current_period_end?: number }).current_period_end ??
    (item as unknown as { current_period_end?: number })?.current_period_end;
  // The local fake ignores trials; a trial we asked for is recorded as such.
  const trialEnd = sub.trial_end
    ? new Date(sub.trial_end * 1000)
    : requestedTrialDays
      ? new Date(Date.now() + requestedTrialDays * 86400_000)
      : null;
  const status = sub.status === 'active' && requestedTrialDays && !sub.trial_end ? 'trialing' : sub.status;
  return {
    subscriptionId: sub.id,
    itemId: item.id,
    status,
    currentPeriodEnd: periodEnd ? new Date(periodEnd * 1000) : null,
    trialEndsAt: trialEnd,
    cancelAtPeriodEnd: sub.cancel_at_period_end,
    quantity: item.quantity ?? 0,
  };
}
