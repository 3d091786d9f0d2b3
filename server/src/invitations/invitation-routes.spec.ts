import path from 'node:path';
import request from 'supertest';
import { MailCatcher } from '../../../infra/src/mail-catcher';
import { freePort } from '../../../infra/src/port-check';
import { AuditEvent, Invitation, Membership, User } from '../models/init-models';
import { linkToken, waitForMail } from '../test-support/mail-inbox';
import { bearer, refreshCookieOf, signUp, startTestApp, type TestApp } from '../test-support/test-app';
import { hashToken } from '../accounts/secure-token';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const invite = (app: TestApp['app'], token: string, workspaceId: string, email: string, role = 'designer') =>
  request(app).post(`/api/v1/workspaces/${workspaceId}/invitations`).set(bearer(token)).send({ email, role });

describe('the invitation flow over HTTP with the real mail', () => {
  it('invites by e-mail; the new teammate accepts from the mail and becomes a member', async () => {
    const owner = await signUp(t.app, { workspaceName: 'Flow Lab' });
    const created = await invite(t.app, owner.accessToken, owner.workspace.id, 'new.mate@example.test').expect(201);
    expect(created.body).toMatchObject({
      email: 'new.mate@example.test',
      role: 'designer',
      status: 'pending',
      delivery: 'sent',
      invitedBy: { id: owner.user.id },
    });

    const mail = await waitForMail('new.mate@example.test');
    expect(mail.subject).toBe('Join Flow Lab on Tumblewise');
    expect(mail.text).toContain(`${t.ctx.config.publicUrl}/invitations/accept?token=`);
    const token = linkToken(mail, '/invitations/accept');
    expect(await Invitation.count({ where: { tokenHash: token } })).toBe(0); // only the hash is stored

    const preview = await request(t.app).get('/api/v1/invitations/preview').query({ token }).expect(200);
    expect(preview.body).toMatchObject({
      workspaceName: 'Flow Lab',
      email: 'new.mate@example.test',
      role: 'designer',
      accountExists: false,
    });

    const missing = await request(t.app).post('/api/v1/invitations/accept').send({ token, name: 'New Mate' }).expect(400);
    expect(missing.body.error.field).toBe('password');
    const accepted = await request(t.app)
      .post('/api/v1/invitations/accept')
      .send({ token, name: 'New Mate', password: 'mate-password-1' })
      .expect(200);
    expect(accepted.body.workspace.id).toBe(owner.workspace.id);
    expect(accepted.body.memberships).toEqual([expect.objectContaining({ role: 'designer' })]);
    refreshCookieOf(accepted.headers['set-cookie']);

    const members = await request(t.app).get(`/api/v1/workspaces/${owner.workspace.id}/members`).set(bearer(owner.accessToken)).expect(200);
    expect(members.body.map((m: { email: string }) => m.email)).toEqual([owner.user.email, 'new.mate@example.test']);
    // Single use.
    await request(t.app).post('/api/v1/invitations/accept').send({ token, name: 'Again', password: 'mate-password-1' }).expect(410);
    const actions = (await AuditEvent.findAll({ where: { workspaceId: owner.workspace.id } })).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['workspace.created', 'invitation.created', 'invitation.accepted']));
  });

  it('adds the membership to a signed-in user whose address was invited', async () => {
    const owner = await signUp(t.app);
    const invitee = await signUp(t.app, { email: 'has.account@example.test' });
    await invite(t.app, owner.accessToken, owner.workspace.id, 'has.account@example.test', 'reviewer').expect(201);
    const token = linkToken(await waitForMail('has.account@example.test'), '/invitations/accept');
    const preview = await request(t.app).get('/api/v1/invitations/preview').query({ token }).expect(200);
    expect(preview.body.accountExists).toBe(true);
    const anonymous = await request(t.app)
      .post('/api/v1/invitations/accept')
      .send({ token, name: 'X', password: 'whatever-pass-1' })
      .expect(409);
    expect(anonymous.body.error.code).toBe('account_exists');
    const res = await request(t.app).post('/api/v1/invitations/accept').set(bearer(invitee.accessToken)).send({ token }).expect(200);
    expect(res.body.memberships.map((m: { role: string }) => m.role).sort()).toEqual(['owner', 'reviewer']);
  });

  it('refuses to accept for a different signed-in address', async () => {
    const owner = await signUp(t.app);
    const stranger = await signUp(t.app);
    await invite(t.app, owner.accessToken, owner.workspace.id, 'intended@example.test').expect(201);
    const token = linkToken(await waitForMail('intended@example.test'), '/invitations/accept');
    const res = await request(t.app).post('/api/v1/invitations/accept').set(bearer(stranger.accessToken)).send({ token }).expect(409);
    expect(res.body.error.code).toBe('email_mismatch');
    expect(await Membership.count({ where: { workspaceId: owner.workspace.id } })).toBe(1);
  });

  it('refuses duplicates: an existing member, a pending invitation', async () => {
    const owner = await signUp(t.app);
    expect((await invite(t.app, owner.accessToken, owner.workspace.id, owner.user.email).expect(409)).body.error.code).toBe(
      'already_member',
    );
    await invite(t.app, owner.accessToken, owner.workspace.id, 'dup@example.test').expect(201);
    expect((await invite(t.app, owner.accessToken, owner.workspace.id, 'DUP@example.test').expect(409)).body.error).toMatchObject({
      code: 'already_invited',
      field: 'email',
    });
  });

  it('lets only an owner invite an owner', async () => {
    const owner = await signUp(t.app);
    const admin = await signUp(t.app);
    await Membership.create({ workspaceId: owner.workspace.id, userId: admin.user.id, role: 'admin' });
    await invite(t.app, admin.accessToken, owner.workspace.id, 'would-be-owner@example.test', 'owner').expect(403);
    await invite(t.app, owner.accessToken, owner.workspace.id, 'would-be-owner@example.test', 'owner').expect(201);
  });
});

describe('expiry, revoke and re-send', () => {
  it('expires after 7 days', async () => {
    const owner = await signUp(t.app);
    const res = await invite(t.app, owner.accessToken, owner.workspace.id, 'late@example.test').expect(201);
    const days = (new Date(res.body.expiresAt).getTime() - Date.now()) / 86400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
    const token = linkToken(await waitForMail('late@example.test'), '/invitations/accept');
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    await request(t.app).get('/api/v1/invitations/preview').query({ token }).expect(410);
    await request(t.app).post('/api/v1/invitations/accept').send({ token, name: 'Late', password: 'late-password-1' }).expect(410);
    const list = await request(t.app)
      .get(`/api/v1/workspaces/${owner.workspace.id}/invitations`)
      .set(bearer(owner.accessToken))
      .expect(200);
    expect(list.body[0].status).toBe('expired');
    // A fresh invitation to the same address is allowed once the old one expired.
    await invite(t.app, owner.accessToken, owner.workspace.id, 'late@example.test').expect(201);
  });

  it('revoked links stop working; re-send issues a new link and the old one dies', async () => {
    const owner = await signUp(t.app);
    const a = await invite(t.app, owner.accessToken, owner.workspace.id, 'revoke-me@example.test').expect(201);
    const tokenA = linkToken(await waitForMail('revoke-me@example.test'), '/invitations/accept');
    const revoked = await request(t.app)
      .delete(`/api/v1/workspaces/${owner.workspace.id}/invitations/${a.body.id}`)
      .set(bearer(owner.accessToken))
      .expect(200);
    expect(revoked.body.status).toBe('revoked');
    await request(t.app).post('/api/v1/invitations/accept').send({ token: tokenA, name: 'R', password: 'revoked-pass-1' }).expect(410);
    await request(t.app)
      .post(`/api/v1/workspaces/${owner.workspace.id}/invitations/${a.body.id}/resend`)
      .set(bearer(owner.accessToken))
      .expect(409);

    const b = await invite(t.app, owner.accessToken, owner.workspace.id, 'resend-me@example.test').expect(201);
    const first = linkToken(await waitForMail('resend-me@example.test'), '/invitations/accept');
    await request(t.app)
      .post(`/api/v1/workspaces/${owner.workspace.id}/invitations/${b.body.id}/resend`)
      .set(bearer(owner.accessToken))
      .expect(200);
    const second = linkToken(await waitForMail('resend-me@example.test', { count: 2 }), '/invitations/accept');
    expect(second).not.toBe(first);
    await request(t.app).get('/api/v1/invitations/preview').query({ token: first }).expect(410);
    await request(t.app).get('/api/v1/invitations/preview').query({ token: second }).expect(200);
    const actions = (await AuditEvent.findAll({ where: { workspaceId: owner.workspace.id }, order: [['createdAt', 'ASC']] })).map(
      (e) => e.action,
    );
    expect(actions).toEqual(expect.arrayContaining(['invitation.revoked', 'invitation.resent']));
  });
});

describe('mail server down, then back', () => {
  it('keeps the invitation as "not sent" with the reason, and re-send works once the server is back', async () => {
    const smtpPort = await freePort();
    const webPort = await freePort();
    const own = await startTestApp({ SMTP_PORT: String(smtpPort) });
    const catcher = new MailCatcher({ smtpPort, webPort, mailDir: path.join(process.env.TEST_ROOT!, `maildev-${smtpPort}`) });
    try {
      const owner = await signUp(own.app);
      const res = await invite(own.app, owner.accessToken, owner.workspace.id, 'offline@example.test').expect(201);
      expect(res.body.delivery).toBe('not_sent');
      expect(res.body.deliveryError).toMatch(/not reachable/);
      expect(await Invitation.count({ where: { id: res.body.id } })).toBe(1);
      expect(await AuditEvent.count({ where: { workspaceId: owner.workspace.id, action: 'invitation.delivery_failed' } })).toBe(1);

      await catcher.start();
      const again = await request(own.app)
        .post(`/api/v1/workspaces/${owner.workspace.id}/invitations/${res.body.id}/resend`)
        .set(bearer(owner.accessToken))
        .expect(200);
      expect(again.body).toMatchObject({ delivery: 'sent', deliveryError: null });
      const mail = await waitForMail('offline@example.test', { inboxUrl: catcher.inboxUrl });
      const token = linkToken(mail, '/invitations/accept');
      await request(own.app).post('/api/v1/invitations/accept').send({ token, name: 'Back Online', password: 'back-online-1' }).expect(200);
      expect(await User.count({ where: { email: 'offline@example.test' } })).toBe(1);
    } finally {
      await own.close();
      await catcher.stop();
    }
  });
});
