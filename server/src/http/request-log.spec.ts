import { Writable } from 'node:stream';
import request from 'supertest';
import { linkToken, waitForMail } from '../test-support/mail-inbox';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

/** Structured request logs (pino) name method, path and status, and never a secret. */
let t: TestApp;
const lines: string[] = [];
beforeAll(async () => {
  const sink = new Writable({
    write(chunk, _enc, done) {
      lines.push(...String(chunk).split('\n').filter(Boolean));
      done();
    },
  });
  t = await startTestApp({ LOG_LEVEL: 'info' }, { logStream: sink });
});
afterAll(async () => {
  await t.close();
});

it('logs each API request as JSON without passwords, tokens or cookies', async () => {
  const s = await signUp(t.app, { password: 'very-secret-password-9' });
  await request(t.app).post('/api/v1/auth/signin').send({ email: s.user.email, password: 'very-secret-password-9' }).expect(200);
  await request(t.app).post('/api/v1/auth/refresh').set('Cookie', s.cookie).expect(200);
  await request(t.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(200);
  await request(t.app).post('/api/v1/auth/password-reset').send({ email: s.user.email }).expect(202);
  const token = linkToken(await waitForMail(s.user.email), '/reset-password');
  await request(t.app).get('/api/v1/invitations/preview').query({ token }).expect(410);

  const entries = lines.map((l) => JSON.parse(l) as { req?: { method: string; url: string }; res?: { statusCode: number } });
  const requests = entries.filter((e) => e.req && e.res);
  expect(requests.map((e) => `${e.req!.method} ${e.req!.url.split('?')[0]} ${e.res!.statusCode}`)).toEqual(
    expect.arrayContaining([
      'POST /api/v1/auth/signin 200',
      'POST /api/v1/auth/refresh 200',
      'GET /api/v1/me 200',
      'GET /api/v1/invitations/preview 410',
    ]),
  );
  const all = lines.join('\n');
  for (const secret of ['very-secret-password-9', s.accessToken, s.cookie.split('=')[1], token]) {
    expect(all.includes(secret)).toBe(false);
  }
  expect(all).toContain('token=[hidden]');
});
