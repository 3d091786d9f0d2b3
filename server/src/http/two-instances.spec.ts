import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { freePort, waitForPort } from '../../../infra/src/port-check';
import { cloneTemplateDatabase } from '../test-support/test-app';

/**
 * Two server processes on two ports sharing one database behave as one: attempt counters and
 * revocations live in PostgreSQL, not in either process's memory.
 */
const root = path.resolve(__dirname, '../../..');
const children: ChildProcess[] = [];
let a = '';
let b = '';

async function startInstance(env: Record<string, string>): Promise<string> {
  const port = await freePort();
  const child = spawn(process.execPath, [path.join(root, 'node_modules/tsx/dist/cli.mjs'), path.join(root, 'server/src/main.ts')], {
    env: { ...process.env, ...env, PORT: String(port), LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  children.push(child);
  const exited = new Promise<never>((_, reject) =>
    child.once('exit', (code) => reject(new Error(`the server process exited early (code ${code})`))),
  );
  exited.catch(() => undefined); // exiting later, at teardown, is expected
  await Promise.race([waitForPort(port, 60000), exited]);
  return `http://127.0.0.1:${port}/api/v1`;
}

beforeAll(async () => {
  const { url } = await cloneTemplateDatabase();
  const env = { DATABASE_URL: url, RATE_LIMIT_SIGNIN: '3', NODE_ENV: 'test' };
  [a, b] = await Promise.all([startInstance(env), startInstance(env)]);
}, 90000);

afterAll(async () => {
  await Promise.all(
    children.map(
      (c) =>
        new Promise((resolve) => {
          c.once('exit', resolve);
          c.kill('SIGTERM');
        }),
    ),
  );
});

const post = (base: string, p: string, body: unknown, headers: Record<string, string> = {}) =>
  fetch(base + p, { method: 'POST', headers: { 'content-type': 'application/json', ...headers }, body: JSON.stringify(body) });
const cookieOf = (res: Response) =>
  res.headers
    .getSetCookie()
    .find((c) => c.startsWith('tw_refresh='))!
    .split(';')[0];

it('shares the sign-in attempt limit between the instances', async () => {
  const email = 'limited@example.test';
  await post(a, '/auth/signup', { workspaceName: 'Limit Lab', name: 'L', email, password: 'right-password-1' });
  const statuses = [];
  for (const base of [a, b, a, b]) statuses.push((await post(base, '/auth/signin', { email, password: 'wrong-password-1' })).status);
  expect(statuses).toEqual([401, 401, 401, 429]);
  const blocked = await post(a, '/auth/signin', { email, password: 'right-password-1' });
  expect(blocked.status).toBe(429);
  expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
});

it('a sign-out on one instance ends the session on the other', async () => {
  const res = await post(a, '/auth/signup', {
    workspaceName: 'Two Lab',
    name: 'T',
    email: 'two@example.test',
    password: 'right-password-1',
  });
  const { accessToken } = (await res.json()) as { accessToken: string };
  const cookie = cookieOf(res);
  expect((await fetch(`${b}/me`, { headers: { authorization: `Bearer ${accessToken}` } })).status).toBe(200);
  expect((await post(b, '/auth/signout', {}, { cookie, authorization: `Bearer ${accessToken}` })).status).toBe(204);
  expect((await fetch(`${a}/me`, { headers: { authorization: `Bearer ${accessToken}` } })).status).toBe(401);
  expect((await post(a, '/auth/refresh', {}, { cookie })).status).toBe(401);
});

it('a refresh token rotated on one instance is recognised as reused on the other', async () => {
  const res = await post(a, '/auth/signup', {
    workspaceName: 'Rot Lab',
    name: 'R',
    email: 'rot@example.test',
    password: 'right-password-1',
  });
  const first = cookieOf(res);
  const rotated = await post(a, '/auth/refresh', {}, { cookie: first });
  expect(rotated.status).toBe(200);
  const reuse = await post(b, '/auth/refresh', {}, { cookie: first });
  expect(reuse.status).toBe(401);
  expect(((await reuse.json()) as { error: { code: string } }).error.code).toBe('refresh_reused');
  expect((await post(a, '/auth/refresh', {}, { cookie: cookieOf(rotated) })).status).toBe(401);
});
