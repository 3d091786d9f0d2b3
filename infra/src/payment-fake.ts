import { randomBytes } from 'node:crypto';
import express, { type Request } from 'express';
import type { Server } from 'node:http';
import Stripe from 'stripe';
// The stateful payment-provider fake; its own CLI binds every interface, so it is embedded here.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExpressApp } = require('stripe-stateful-mock') as { createExpressApp: () => express.Express };

/** The fields of the provider's JSON objects (subscriptions, items) this fake reads; the rest passes through. */
type ProviderObject = Record<string, unknown> & {
  id: string;
  customer: string;
  quantity: number;
  items: { data: { id: string; quantity: number }[] };
};

export interface PaymentFakeOptions {
  /** Where provider events are delivered (our server's /api/v1/billing/webhook), signed with `webhookSecret`. */
  webhookUrl?: string;
  webhookSecret?: string;
}

interface FakeSubscription {
  id: string;
  customer: string;
  itemId: string;
  quantity: number;
  unitAmount: number;
  currency: string;
  cancelAtPeriodEnd: boolean;
  status: string;
  periodEnd: number;
}
interface FakeInvoice {
  id: string;
  object: 'invoice';
  number: string;
  customer: string;
  subscription: string;
  created: number;
  amount_due: number;
  amount_paid: number;
  currency: string;
  status: 'paid' | 'open';
  description: string;
  hosted_invoice_url: string;
  invoice_pdf: null;
}

const MOCK = '/__provider-mock';
const id = (prefix: string) => `${prefix}_${randomBytes(9).toString('base64url')}`;
const now = () => Math.floor(Date.now() / 1000);

/**
 * Starts the local payment-provider fake on 127.0.0.1:port: stripe-stateful-mock, plus a thin layer
 * of ours in front of it for what the mock lacks, in the provider's documented shapes — subscription
 * update (cancel at period end) and cancel, invoices (list, a document page), event delivery to a
 * webhook endpoint signed like the provider does, and a test helper that renews a subscription with a
 * paid or failed invoice (`POST /v1/test_helpers/subscriptions/:id/renew`, outcome=paid|failed).
 */
export async function startPaymentFake(
  port: number,
  options: PaymentFakeOptions = {},
): Promise<{ url: string; close: () => Promise<void> }> {
  const base = `http://127.0.0.1:${port}`;
  const signer = new Stripe('sk_test_signer');
  const subscriptions = new Map<string, FakeSubscription>();
  const invoices: FakeInvoice[] = [];
  let webhook = options.webhookUrl && options.webhookSecret ? { url: options.webhookUrl, secret: options.webhookSecret } : null;
  let invoiceCounter = 1000;

  const forward = async (req: Request, path = req.originalUrl): Promise<{ status: number; body: ProviderObject }> => {
    const res = await fetch(`${base}${MOCK}${path}`, {
      method: req.method,
      headers: {
        authorization: req.get('authorization') ?? '',
        'content-type': 'application/x-www-form-urlencoded',
        'idempotency-key': req.get('idempotency-key') ?? id('idem'),
      },
      body: req.method === 'GET' || req.method === 'DELETE' ? undefined : (req.body as Buffer).toString('utf8'),
    });
    return { status: res.status, body: (await res.json()) as ProviderObject };
  };
  const form = (req: Request) => new URLSearchParams(Buffer.isBuffer(req.body) ? req.body.toString('utf8') : '');
  const subscriptionObject = (s: FakeSubscription) => ({
    id: s.id,
    object: 'subscription',
    customer: s.customer,
    status: s.status,
    cancel_at_period_end: s.cancelAtPeriodEnd,
    current_period_end: s.periodEnd,
    items: { object: 'list', data: [{ id: s.itemId, object: 'subscription_item', quantity: s.quantity }] },
    metadata: {},
  });
  // Events are stamped when the change happens and delivered one at a time, in that order.
  let deliveries = Promise.resolve();
  const deliver = (type: string, object: object): Promise<void> => {
    if (!webhook) return deliveries;
    const target = webhook;
    const payload = JSON.stringify({
      id: id('evt'),
      object: 'event',
      type,
      created: now(),
      data: { object: structuredClone(object) },
      livemode: false,
      api_version: '2024-06-20',
    });
    deliveries = deliveries.then(async () => {
      const header = signer.webhooks.generateTestHeaderString({ payload, secret: target.secret });
      await fetch(target.url, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'stripe-signature': header },
        body: payload,
      }).catch(() => undefined);
    });
    return deliveries;
  };
  const invoiceFor = (s: FakeSubscription, amount: number, status: FakeInvoice['status'], description: string): FakeInvoice => {
    const invId = id('in');
    const inv: FakeInvoice = {
      id: invId,
      object: 'invoice',
      number: `TW-${++invoiceCounter}`,
      customer: s.customer,
      subscription: s.id,
      created: now(),
      amount_due: amount,
      amount_paid: status === 'paid' ? amount : 0,
      currency: s.currency,
      status,
      description,
      hosted_invoice_url: `${base}/v1/invoices/${invId}/document`,
      invoice_pdf: null,
    };
    invoices.push(inv);
    return inv;
  };

  const app = express();
  app.get('/healthz', (_req, res) => {
    res.json({ ok: true });
  });
  const layer = express.Router();
  // Only our own routes read the body; everything else reaches the mock untouched.
  const raw = express.raw({ type: () => true, limit: '1mb' });

  layer.post('/v1/webhook_endpoints', raw, (req, res) => {
    const url = form(req).get('url');
    if (!url) {
      res.status(400).json({ error: { type: 'invalid_request_error', message: 'Missing required param: url.', param: 'url' } });
      return;
    }
    webhook = { url, secret: `whsec_${randomBytes(18).toString('base64url')}` };
    res.json({ id: id('we'), object: 'webhook_endpoint', url, secret: webhook.secret, status: 'enabled' });
  });

  layer.post('/v1/subscriptions', raw, async (req, res) => {
    const out = await forward(req);
    if (out.status === 200) {
      const f = form(req);
      const plan = (await fetch(`${base}${MOCK}/v1/plans/${encodeURIComponent(f.get('items[0][plan]') ?? '')}`, {
        headers: { authorization: req.get('authorization') ?? '' },
      })
        .then((r) => r.json())
        .catch(() => ({}))) as { amount?: number; currency?: string };
      const trialDays = Number(f.get('trial_period_days') ?? 0);
      const s: FakeSubscription = {
        id: out.body.id,
        customer: out.body.customer,
        itemId: out.body.items.data[0].id,
        quantity: out.body.items.data[0].quantity,
        unitAmount: plan.amount ?? 0,
        currency: plan.currency ?? 'eur',
        cancelAtPeriodEnd: false,
        status: trialDays > 0 ? 'trialing' : 'active',
        periodEnd: now() + (trialDays > 0 ? trialDays : 30) * 86400,
      };
      subscriptions.set(s.id, s);
      const body = { ...out.body, ...subscriptionObject(s), trial_end: trialDays > 0 ? now() + trialDays * 86400 : null };
      res.json(body);
      const first = invoiceFor(
        s,
        trialDays > 0 ? 0 : s.quantity * s.unitAmount,
        'paid',
        trialDays > 0 ? `Trial of ${trialDays} days, ${s.quantity} seats` : `${s.quantity} seats`,
      );
      void deliver('customer.subscription.created', subscriptionObject(s));
      void deliver('invoice.paid', first);
      return;
    }
    res.status(out.status).json(out.body);
  });

  layer.post('/v1/subscriptions/:id', raw, async (req, res) => {
    const s = subscriptions.get(req.params.id);
    if (!s) {
      res
        .status(404)
        .json({ error: { type: 'invalid_request_error', code: 'resource_missing', message: `No such subscription: '${req.params.id}'` } });
      return;
    }
    const cancel = form(req).get('cancel_at_period_end');
    if (cancel !== null) s.cancelAtPeriodEnd = cancel === 'true';
    res.json(subscriptionObject(s));
    void deliver('customer.subscription.updated', subscriptionObject(s));
  });

  layer.delete('/v1/subscriptions/:id', raw, (req, res) => {
    const s = subscriptions.get(req.params.id);
    if (!s) {
      res
        .status(404)
        .json({ error: { type: 'invalid_request_error', code: 'resource_missing', message: `No such subscription: '${req.params.id}'` } });
      return;
    }
    s.status = 'canceled';
    res.json(subscriptionObject(s));
    void deliver('customer.subscription.deleted', subscriptionObject(s));
  });

  layer.post('/v1/subscription_items/:id', raw, async (req, res) => {
    const out = await forward(req);
    const s = [...subscriptions.values()].find((x) => x.itemId === req.params.id);
    if (out.status === 200 && s) {
      const before = s.quantity;
      s.quantity = out.body.quantity;
      if (s.quantity > before) invoiceFor(s, 0, 'open', `Proration: ${s.quantity - before} more seat(s), charged on the next invoice`);
      void deliver('customer.subscription.updated', subscriptionObject(s));
    }
    res.status(out.status).json(out.body);
  });

  layer.get('/v1/invoices', (req, res) => {
    const customer = String(req.query.customer ?? '');
    res.json({
      object: 'list',
      data: invoices.filter((i) => !customer || i.customer === customer).sort((a, b) => b.created - a.created),
      has_more: false,
      url: '/v1/invoices',
    });
  });

  layer.get('/v1/invoices/:id/document', (req, res) => {
    const inv = invoices.find((i) => i.id === req.params.id);
    if (!inv) {
      res.status(404).type('text/plain').send('No such invoice.');
      return;
    }
    res
      .type('text/html')
      .send(
        `<!doctype html><title>Invoice ${inv.number}</title><h1>Invoice ${inv.number}</h1><p>${inv.description}</p><p>Amount: ${(inv.amount_due / 100).toFixed(2)} ${inv.currency.toUpperCase()} — ${inv.status}</p><p>Local payment fake: not a real invoice.</p>`,
      );
  });

  layer.post('/v1/test_helpers/subscriptions/:id/renew', raw, (req, res) => {
    const s = subscriptions.get(req.params.id);
    if (!s) {
      res.status(404).json({ error: { type: 'invalid_request_error', code: 'resource_missing', message: 'No such subscription.' } });
      return;
    }
    const failed = form(req).get('outcome') === 'failed';
    s.periodEnd += 30 * 86400;
    if (s.status === 'trialing') s.status = 'active';
    const inv = invoiceFor(s, s.quantity * s.unitAmount, failed ? 'open' : 'paid', `${s.quantity} seats, monthly`);
    if (failed) s.status = 'past_due';
    res.json(inv);
    void deliver(failed ? 'invoice.payment_failed' : 'invoice.paid', inv);
    void deliver('customer.subscription.updated', subscriptionObject(s));
  });

  app.use(layer);
  const mock = createExpressApp();
  app.use(MOCK, mock);
  app.use(mock);
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
  return {
    url: base,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
