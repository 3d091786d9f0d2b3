import request from 'supertest';
import { User } from '../models/init-models';
import { startTestApp, type TestApp } from '../test-support/test-app';

/** Attempt limits on sign-up and password reset answer 429 with Retry-After (sign-in: two-instances.spec.ts). */
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ RATE_LIMIT_SIGNUP: '2', RATE_LIMIT_PASSWORD_RESET: '2', RATE_LIMIT_WINDOW_SECONDS: '600' });
});
afterAll(async () => {
  await t.close();
});

it('limits sign-ups per address and writes nothing once limited', async () => {
  const body = (n: number) => ({ workspaceName: `Limit ${n}`, name: 'N', email: `limit-${n}@example.test`, password: 'limit-password-1' });
  await request(t.app).post('/api/v1/auth/signup').send(body(1)).expect(201);
  await request(t.app).post('/api/v1/auth/signup').send(body(2)).expect(201);
  const limited = await request(t.app).post('/api/v1/auth/signup').send(body(3)).expect(429);
  expect(limited.body.error.code).toBe('too_many_attempts');
  const retryAfter = Number(limited.headers['retry-after']);
  expect(retryAfter).toBeGreaterThan(0);
  expect(retryAfter).toBeLessThanOrEqual(600);
  expect(await User.count({ where: { email: 'limit-3@example.test' } })).toBe(0);
});

it('limits password-reset requests per address and e-mail', async () => {
  for (let i = 0; i < 2; i++) await request(t.app).post('/api/v1/auth/password-reset').send({ email: 'someone@example.test' }).expect(202);
  const limited = await request(t.app).post('/api/v1/auth/password-reset').send({ email: 'someone@example.test' }).expect(429);
  expect(limited.headers['retry-after']).toMatch(/^\d+$/);
  // Another address from the same client is counted separately.
  await request(t.app).post('/api/v1/auth/password-reset').send({ email: 'someone-else@example.test' }).expect(202);
});
