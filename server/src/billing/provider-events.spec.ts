import type { Server } from 'node:http';
import request from 'supertest';
import { Workspace } from '../models/init-models';
import { freePort } from '../../../infra/src/port-check';
import { eventually } from '../test-support/eventually';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

/**
 * The whole loop over real HTTP: the server subscribes at the payment fake, the fake renews with a
 * failed then a paid invoice and delivers the signed events to the listening server's webhook.
 */
let t: TestApp;
let server: Server;
beforeAll(async () => {
  const port = await freePort();
  const endpoint = (await fetch(`${process.env.PAYMENT_API_URL}/v1/webhook_endpoints`, {
    method: 'POST',
    headers: { authorization: 'Bearer sk_test_events', 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ url: `http://127.0.0.1:${port}/api/v1/billing/webhook`, 'enabled_events[]': '*' }),
  }).then((r) => r.json())) as { secret: string };
  t = await startTestApp({ PAYMENT_WEBHOOK_SECRET: endpoint.secret });
  server = await new Promise((resolve) => {
    const s = t.app.listen(port, '127.0.0.1', () => resolve(s));
  });
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  await t.close();
});

/** Waits for the provider's event to reach the workspace row. */
const until = (check: () => Promise<boolean>) => eventually(check, (ok) => ok, { what: 'the provider event', timeoutMs: 20_000 });

it('turns past due on a failed renewal and back on a paid one', async () => {
  const owner = await signUp(t.app);
  const base = `/api/v1/workspaces/${owner.workspace.id}`;
  await request(t.app)
    .post(`${base}/billing/subscription`)
    .set(bearer(owner.accessToken))
    .send({ seats: 2, cardToken: 'tok_visa' })
    .expect(200);
  const w = (await Workspace.findByPk(owner.workspace.id))!;
  // The subscription's own events (created, the trial invoice paid) arrive first.
  await until(async () => (await Workspace.findByPk(w.id))!.billingEventAt !== null);
  const renew = (outcome: string) =>
    fetch(`${process.env.PAYMENT_API_URL}/v1/test_helpers/subscriptions/${w.subscriptionId}/renew`, {
      method: 'POST',
      headers: { authorization: 'Bearer sk_test_events', 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ outcome }),
    });
  expect((await renew('failed')).status).toBe(200);
  await until(async () => (await Workspace.findByPk(w.id))!.state === 'past_due');
  expect((await renew('paid')).status).toBe(200);
  await until(async () => (await Workspace.findByPk(w.id))!.state === 'active');
  const invoices = await request(t.app).get(`${base}/billing/invoices`).set(bearer(owner.accessToken)).expect(200);
  expect(invoices.body.map((i: { status: string }) => i.status)).toEqual(expect.arrayContaining(['paid', 'open']));
  expect(invoices.body[0].documentUrl).toMatch(/\/v1\/invoices\/in_.+\/document$/);
});
