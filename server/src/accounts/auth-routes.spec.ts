import request from 'supertest';
import { PasswordReset, RefreshToken, SignInSession, User } from '../models/init-models';
import { bearer, refreshCookieOf, signUp, startTestApp, type TestApp } from '../test-support/test-app';
import { linkToken, waitForMail } from '../test-support/mail-inbox';
import { hashToken } from './secure-token';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('sign-up and sign-in', () => {
  it('creates a workspace with its owner and signs them in', async () => {
    const s = await signUp(t.app, { workspaceName: 'Harbour Lab', email: 'Mixed.Case@Example.test' });
    expect(s.user.email).toBe('mixed.case@example.test');
    expect(s.workspace.name).toBe('Harbour Lab');
    expect(s.memberships).toEqual([expect.objectContaining({ role: 'owner', workspace: expect.objectContaining({ id: s.workspace.id }) })]);
    const me = await request(t.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(200);
    expect(me.body.user.id).toBe(s.user.id);
    const stored = await User.findByPk(s.user.id);
    expect(stored!.passwordHash).toMatch(/^\$2[aby]\$04\$/); // bcrypt, cost 4 in tests
  });

  it('sets the refresh token as an httpOnly SameSite cookie and stores only its hash', async () => {
    const res = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'Cookie Lab', name: 'C', email: 'cookie@example.test', password: 'correct-horse-42' })
      .expect(201);
    const header = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('tw_refresh='))!;
    expect(header).toMatch(/HttpOnly/);
    expect(header).toMatch(/SameSite=Strict/);
    expect(header).toMatch(/Path=\/api\/v1\/auth/);
    const token = refreshCookieOf(header).split('=')[1];
    expect(await RefreshToken.count({ where: { tokenHash: hashToken(token) } })).toBe(1);
    expect(await RefreshToken.count({ where: { tokenHash: token } })).toBe(0);
  });

  it('refuses a second account with the same e-mail (409 naming email)', async () => {
    await signUp(t.app, { email: 'twice@example.test' });
    const res = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'Other', name: 'X', email: 'twice@example.test', password: 'correct-horse-42' })
      .expect(409);
    expect(res.body.error).toMatchObject({ code: 'email_taken', field: 'email' });
  });

  it('signs in with the right password and refuses a wrong one alike for unknown addresses', async () => {
    const s = await signUp(t.app);
    const ok = await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: s.password }).expect(200);
    expect(ok.body.accessToken).toEqual(expect.any(String));
    const wrong = await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: 'not-the-password' }).expect(401);
    const unknown = await request(t.app)
      .post('/api/v1/auth/signin')
      .send({ email: 'nobody@example.test', password: 'not-the-password' })
      .expect(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('enforces the password length 10–72 characters', async () => {
    const short = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'W1', name: 'N', email: 'short@example.test', password: 'nine-char' })
      .expect(400);
    expect(short.body.error.field).toBe('password');
    const long = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'W1', name: 'N', email: 'long@example.test', password: 'x'.repeat(73) })
      .expect(400);
    expect(long.body.error.field).toBe('password');
    // 72 characters but more than 72 bytes: bcrypt would silently ignore the tail.
    const bytes = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'W1', name: 'N', email: 'bytes@example.test', password: 'é'.repeat(40) })
      .expect(400);
    expect(bytes.body.error.field).toBe('password');
    await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ workspaceName: 'W1', name: 'N', email: 'exact@example.test', password: 'x'.repeat(72) })
      .expect(201);
    expect(await User.count({ where: { email: ['short@example.test', 'long@example.test', 'bytes@example.test'] } })).toBe(0);
  });
});

describe('access tokens', () => {
  it('rejects a token signed with another key, a wrong audience and a garbled header', async () => {
    const jwt = await import('jsonwebtoken');
    const s = await signUp(t.app);
    const foreign = jwt.default.sign({ sid: 'x' }, 'another-secret-another-secret-another', {
      subject: s.user.id,
      issuer: 'tumblewise',
      audience: 'tumblewise-api',
    });
    expect((await request(t.app).get('/api/v1/me').set(bearer(foreign)).expect(401)).body.error.code).toBe('token_invalid');
    const wrongAudience = jwt.default.sign({ sid: 'x' }, t.ctx.config.auth.jwtSecret, {
      subject: s.user.id,
      issuer: 'tumblewise',
      audience: 'someone-else',
    });
    await request(t.app).get('/api/v1/me').set(bearer(wrongAudience)).expect(401);
    const none = jwt.default.sign({ sid: 'x', sub: s.user.id, iss: 'tumblewise', aud: 'tumblewise-api' }, '', { algorithm: 'none' });
    await request(t.app).get('/api/v1/me').set('Authorization', `Bearer ${none}`).expect(401);
    await request(t.app).get('/api/v1/me').set('Authorization', 'Token abc').expect(401);
    await request(t.app).get('/api/v1/me').expect(401);
  });
});

describe('refresh rotation', () => {
  it('rotates the refresh token on every refresh', async () => {
    const s = await signUp(t.app);
    const first = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(200);
    const second = refreshCookieOf(first.headers['set-cookie']);
    expect(second).not.toBe(s.cookie);
    const again = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', second).expect(200);
    await request(t.app).get('/api/v1/me').set(bearer(again.body.accessToken)).expect(200);
  });

  it('revokes the whole token family when a rotated token comes back', async () => {
    const s = await signUp(t.app);
    const rotated = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(200);
    const current = refreshCookieOf(rotated.headers['set-cookie']);
    // The old token is presented again: theft. The session ends for both holders.
    const reuse = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(401);
    expect(reuse.body.error.code).toBe('refresh_reused');
    await request(t.app).post('/api/v1/auth/refresh').set('Cookie', current).expect(401);
    await request(t.app).get('/api/v1/me').set(bearer(rotated.body.accessToken)).expect(401);
    const sessions = await SignInSession.findAll({ where: { userId: s.user.id } });
    expect(sessions.every((x) => x.revokedReason === 'refresh_reused')).toBe(true);
  });

  it('refuses an expired refresh token', async () => {
    const s = await signUp(t.app);
    const token = s.cookie.split('=')[1];
    await RefreshToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    expect((await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(401)).body.error.code).toBe('refresh_expired');
  });

  it('answers 401 without a cookie or with a malformed one', async () => {
    await request(t.app).post('/api/v1/auth/refresh').expect(401);
    await request(t.app).post('/api/v1/auth/refresh').set('Cookie', 'tw_refresh=%27%3B%20DROP%20TABLE%20users').expect(401);
  });
});

describe('sign-out', () => {
  it('revokes the session: the refresh cookie and the access token stop working', async () => {
    const s = await signUp(t.app);
    await request(t.app).post('/api/v1/auth/signout').set('Cookie', s.cookie).set(bearer(s.accessToken)).expect(204);
    await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(401);
    expect((await request(t.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(401)).body.error.code).toBe('session_revoked');
  });
});

describe('password reset', () => {
  it('answers the same whether or not the address has an account', async () => {
    const s = await signUp(t.app);
    const known = await request(t.app).post('/api/v1/auth/password-reset').send({ email: s.user.email }).expect(202);
    const unknown = await request(t.app).post('/api/v1/auth/password-reset').send({ email: 'no-such-person@example.test' }).expect(202);
    expect(known.body).toEqual(unknown.body);
  });

  it('resets once with the e-mailed token, ends other sign-ins, and refuses the token a second time', async () => {
    const s = await signUp(t.app);
    await request(t.app).post('/api/v1/auth/password-reset').send({ email: s.user.email }).expect(202);
    const mail = await waitForMail(s.user.email);
    expect(mail.subject).toMatch(/Reset your Tumblewise password/);
    const token = linkToken(mail, '/reset-password');
    await request(t.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'a-brand-new-secret' }).expect(200);
    await request(t.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(401);
    await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: s.password }).expect(401);
    await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: 'a-brand-new-secret' }).expect(200);
    const again = await request(t.app)
      .post('/api/v1/auth/password-reset/confirm')
      .send({ token, password: 'yet-another-secret' })
      .expect(410);
    expect(again.body.error.code).toBe('token_invalid');
  });

  it('refuses an expired reset token', async () => {
    const s = await signUp(t.app);
    await request(t.app).post('/api/v1/auth/password-reset').send({ email: s.user.email }).expect(202);
    const token = linkToken(await waitForMail(s.user.email), '/reset-password');
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    await request(t.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'a-brand-new-secret' }).expect(410);
    await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: s.password }).expect(200);
  });
});
