import request from 'supertest';
import Stripe from 'stripe';
import { AuditEvent, BillingEvent, Membership, User, Workspace } from '../models/init-models';
import { mailsTo, waitForMail } from '../test-support/mail-inbox';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ EVALUATION_SEATS: '5', BILLING_GRACE_DAYS: '7' });
});
afterAll(async () => {
  await t.close();
});

const signer = new Stripe('sk_test_signer');
let eventCounter = 0;
/** An event signed the way the provider signs (its SDK's test header helper). */
function signedEvent(
  type: string,
  object: object,
  created = Math.floor(Date.now() / 1000),
  eventId = `evt_test_${++eventCounter}_${Date.now()}`,
) {
  const payload = JSON.stringify({ id: eventId, object: 'event', type, created, data: { object } });
  return {
    payload,
    header: signer.webhooks.generateTestHeaderString({ payload, secret: t.ctx.config.payment.webhookSecret }),
    id: eventId,
  };
}
const sendEvent = (e: { payload: string; header: string }) =>
  request(t.app).post('/api/v1/billing/webhook').set('Content-Type', 'application/json').set('Stripe-Signature', e.header).send(e.payload);

async function subscribed(seats = 3) {
  const owner = await signUp(t.app);
  const base = `/api/v1/workspaces/${owner.workspace.id}`;
  const res = await request(t.app)
    .post(`${base}/billing/subscription`)
    .set(bearer(owner.accessToken))
    .send({ seats, cardToken: 'tok_visa' })
    .expect(200);
  return { owner, base, billing: res.body, workspace: (await Workspace.findByPk(owner.workspace.id))! };
}
const invite = (base: string, token: string, email: string) =>
  request(t.app).post(`${base}/invitations`).set(bearer(token)).send({ email, role: 'designer' });

describe('buying seats through the payment provider (local fake over HTTP)', () => {
  it('starts a subscription with the test card: trial, 3 seats, Visa 4242, an invoice', async () => {
    const { billing, base, owner } = await subscribed(3);
    expect(billing.subscription).toMatchObject({ status: 'trialing', cancelAtPeriodEnd: false });
    expect(billing.seats).toMatchObject({ bought: 3, members: 1, pendingInvitations: 0, available: 2, evaluationAllowance: false });
    expect(billing.paymentMethod).toMatchObject({ brand: 'Visa', last4: '4242' });
    const invoices = await request(t.app).get(`${base}/billing/invoices`).set(bearer(owner.accessToken)).expect(200);
    expect(invoices.body[0]).toMatchObject({ status: 'paid', amountDue: 0 });
    expect(await AuditEvent.count({ where: { workspaceId: owner.workspace.id, action: 'billing.subscribed' } })).toBe(1);
  });

  it('a declined card answers 402 and changes nothing', async () => {
    const owner = await signUp(t.app);
    const base = `/api/v1/workspaces/${owner.workspace.id}`;
    const res = await request(t.app)
      .post(`${base}/billing/subscription`)
      .set(bearer(owner.accessToken))
      .send({ seats: 3, cardToken: 'tok_chargeDeclined' })
      .expect(402);
    expect(res.body.error).toMatchObject({ code: 'card_declined', field: 'cardToken' });
    expect(res.body.error.message).toMatch(/declined.*Nothing was changed/);
    const w = (await Workspace.findByPk(owner.workspace.id))!;
    expect([w.customerId, w.subscriptionId, w.seats]).toEqual([null, null, null]);
  });

  it('adds seats, refuses to go below the members and pending invitations, cancels and resumes', async () => {
    const { base, owner } = await subscribed(3);
    await invite(base, owner.accessToken, 'seat-a@example.test').expect(201);
    const more = await request(t.app).patch(`${base}/billing/subscription`).set(bearer(owner.accessToken)).send({ seats: 4 }).expect(200);
    expect(more.body.seats).toMatchObject({ bought: 4, available: 2 });
    const below = await request(t.app).patch(`${base}/billing/subscription`).set(bearer(owner.accessToken)).send({ seats: 1 }).expect(409);
    expect(below.body.error).toMatchObject({ code: 'seats_in_use', field: 'seats' });
    expect((await Workspace.findByPk(owner.workspace.id))!.seats).toBe(4);
    expect(
      (await request(t.app).post(`${base}/billing/subscription/cancel`).set(bearer(owner.accessToken)).expect(200)).body.subscription
        .cancelAtPeriodEnd,
    ).toBe(true);
    expect(
      (await request(t.app).post(`${base}/billing/subscription/resume`).set(bearer(owner.accessToken)).expect(200)).body.subscription
        .cancelAtPeriodEnd,
    ).toBe(false);
  });

  it('only owners change billing; admins read it', async () => {
    const { base, owner } = await subscribed(3);
    const admin = await signUp(t.app);
    await Membership.create({ workspaceId: owner.workspace.id, userId: admin.user.id, role: 'admin' });
    await request(t.app).get(`${base}/billing`).set(bearer(admin.accessToken)).expect(200);
    await request(t.app).patch(`${base}/billing/subscription`).set(bearer(admin.accessToken)).send({ seats: 9 }).expect(403);
  });
});

describe('the seat limit on invitations and acceptance', () => {
  it('refuses the invitation past the seats with 409 and the way out; a seat more lets it through', async () => {
    const { base, owner } = await subscribed(3);
    await invite(base, owner.accessToken, 'one@example.test').expect(201);
    await invite(base, owner.accessToken, 'two@example.test').expect(201);
    const full = await invite(base, owner.accessToken, 'three@example.test').expect(409);
    expect(full.body.error.code).toBe('seat_limit');
    expect(full.body.error.message).toMatch(/buy more seats under Subscription/);
    await request(t.app).patch(`${base}/billing/subscription`).set(bearer(owner.accessToken)).send({ seats: 4 }).expect(200);
    await invite(base, owner.accessToken, 'three@example.test').expect(201);
  });

  it('refuses acceptance when the seats were reduced meanwhile', async () => {
    const { base, owner, workspace } = await subscribed(2);
    await invite(base, owner.accessToken, 'late-joiner@example.test').expect(201);
    const mail = await waitForMail('late-joiner@example.test');
    const token = /token=([A-Za-z0-9_-]+)/.exec(mail.text)![1];
    await workspace.update({ seats: 1 }); // e.g. changed at the provider, arriving by webhook
    const res = await request(t.app)
      .post('/api/v1/invitations/accept')
      .send({ token, name: 'Late', password: 'late-joiner-1' })
      .expect(409);
    expect(res.body.error.code).toBe('seat_limit');
    expect(await User.count({ where: { email: 'late-joiner@example.test' } })).toBe(0);
  });
});

describe('webhooks', () => {
  it('refuses a bad signature with 400 and changes nothing', async () => {
    const { workspace } = await subscribed();
    const e = signedEvent('invoice.payment_failed', { object: 'invoice', customer: workspace.customerId });
    const forged = await request(t.app)
      .post('/api/v1/billing/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', e.header.replace(/v1=[0-9a-f]+/, 'v1=' + '0'.repeat(64)))
      .send(e.payload)
      .expect(400);
    expect(forged.body.error.code).toBe('bad_signature');
    await request(t.app).post('/api/v1/billing/webhook').set('Content-Type', 'application/json').send(e.payload).expect(400);
    await request(t.app)
      .post('/api/v1/billing/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', e.header)
      .send(e.payload.replace('payment_failed', 'paid'))
      .expect(400);
    expect((await Workspace.findByPk(workspace.id))!.state).toBe('active');
    expect(await BillingEvent.count({ where: { id: e.id } })).toBe(0);
  });

  it('a failed payment makes the workspace past due and mails the owners; a replay changes nothing; paying restores it', async () => {
    const { workspace, owner, base } = await subscribed();
    const failed = signedEvent('invoice.payment_failed', {
      object: 'invoice',
      customer: workspace.customerId,
      amount_due: 7200,
      currency: 'eur',
    });
    expect((await sendEvent(failed).expect(200)).body).toEqual({ received: true, duplicate: false, applied: true });
    const w = (await Workspace.findByPk(workspace.id))!;
    expect(w.state).toBe('past_due');
    expect((await waitForMail(owner.user.email, { count: 1 })).subject).toMatch(/^Payment failed/);
    const me = await request(t.app).get('/api/v1/me').set(bearer(owner.accessToken)).expect(200);
    expect(me.body.memberships[0].workspace.state).toBe('past_due');
    // Past due but inside the grace period: saving still works.
    await request(t.app).post(`${base}/projects`).set(bearer(owner.accessToken)).send({ name: 'Still open', category: 'bat' }).expect(201);

    expect((await sendEvent(failed).expect(200)).body).toEqual({ received: true, duplicate: true, applied: false });
    const paid = signedEvent('invoice.paid', {
      object: 'invoice',
      customer: workspace.customerId,
      amount_paid: 7200,
      currency: 'eur',
      number: 'TW-1',
    });
    await sendEvent(paid).expect(200);
    expect((await Workspace.findByPk(workspace.id))!.state).toBe('active');
    const receipt = (await mailsTo(owner.user.email)).find((m) => m.subject.startsWith('Receipt'));
    expect(receipt?.subject).toMatch(/€72\.00/);
  });

  it('an out-of-order (older) event never moves the state back', async () => {
    const { workspace } = await subscribed();
    const t0 = Math.floor(Date.now() / 1000);
    await sendEvent(
      signedEvent('invoice.paid', { object: 'invoice', customer: workspace.customerId, amount_paid: 0, currency: 'eur' }, t0),
    ).expect(200);
    const older = await sendEvent(
      signedEvent('invoice.payment_failed', { object: 'invoice', customer: workspace.customerId }, t0 - 3600),
    ).expect(200);
    expect(older.body).toEqual({ received: true, duplicate: false, applied: false });
    expect((await Workspace.findByPk(workspace.id))!.state).toBe('active');
  });

  it('after the grace period a past-due workspace is read-only: no saves, exports and billing still work', async () => {
    const { workspace, owner, base } = await subscribed();
    await sendEvent(signedEvent('invoice.payment_failed', { object: 'invoice', customer: workspace.customerId })).expect(200);
    await Workspace.update({ pastDueSince: new Date(Date.now() - 8 * 86400_000) }, { where: { id: workspace.id } });
    const refused = await request(t.app)
      .post(`${base}/projects`)
      .set(bearer(owner.accessToken))
      .send({ name: 'Blocked', category: 'bat' })
      .expect(403);
    expect(refused.body.error.code).toBe('workspace_read_only');
    await request(t.app).get(`${base}/projects`).set(bearer(owner.accessToken)).expect(200);
    const billing = await request(t.app).get(`${base}/billing`).set(bearer(owner.accessToken)).expect(200);
    expect(billing.body.workspaceState).toBe('read_only');
    await request(t.app)
      .put(`${base}/billing/payment-method`)
      .set(bearer(owner.accessToken))
      .send({ cardToken: 'tok_mastercard' })
      .expect(200);
  });
});

describe('suspension by an operator', () => {
  it('members can sign in and read, see why, and cannot edit; restoring lifts it; both audited', async () => {
    const { workspace, owner, base } = await subscribed();
    const operator = await signUp(t.app);
    await User.update({ isOperator: true }, { where: { id: operator.user.id } });
    await request(t.app).post(`/api/v1/operator/workspaces/${workspace.id}/suspend`).set(bearer(operator.accessToken)).send({}).expect(400);
    const s = await request(t.app)
      .post(`/api/v1/operator/workspaces/${workspace.id}/suspend`)
      .set(bearer(operator.accessToken))
      .send({ reason: 'Reported abuse under review' })
      .expect(200);
    expect(s.body).toMatchObject({ state: 'suspended', suspendedReason: 'Reported abuse under review' });
    const signin = await request(t.app).post('/api/v1/auth/signin').send({ email: owner.user.email, password: owner.password }).expect(200);
    expect(signin.body.memberships[0].workspace).toMatchObject({ state: 'suspended', suspendedReason: 'Reported abuse under review' });
    await request(t.app).get(`${base}/members`).set(bearer(signin.body.accessToken)).expect(200);
    const write = await request(t.app)
      .post(`${base}/projects`)
      .set(bearer(signin.body.accessToken))
      .send({ name: 'No', category: 'bat' })
      .expect(403);
    expect(write.body.error).toMatchObject({
      code: 'workspace_suspended',
      message: expect.stringContaining('Reported abuse under review'),
    });
    await request(t.app)
      .post(`/api/v1/operator/workspaces/${workspace.id}/restore`)
      .set(bearer(operator.accessToken))
      .send({ reason: 'Cleared' })
      .expect(200);
    await request(t.app).post(`${base}/projects`).set(bearer(signin.body.accessToken)).send({ name: 'Yes', category: 'bat' }).expect(201);
    const actions = (await AuditEvent.findAll({ where: { workspaceId: workspace.id } })).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['workspace.suspended', 'workspace.restored']));
    const list = await request(t.app)
      .get('/api/v1/operator/workspaces')
      .query({ q: workspace.name, sort: 'name' })
      .set(bearer(operator.accessToken))
      .expect(200);
    expect(list.body[0]).toMatchObject({ id: workspace.id, plan: 'Bench', seats: 3, members: 1, state: 'active' });
    await request(t.app).get('/api/v1/operator/workspaces').set(bearer(owner.accessToken)).expect(403);
  });
});
