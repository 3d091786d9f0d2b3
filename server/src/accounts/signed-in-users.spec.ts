import { Client } from 'pg';
import request from 'supertest';
import { eventually } from '../test-support/eventually';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let sql: Client;

beforeAll(async () => {
  t = await startTestApp();
  // Another connection, as another server process or an operator at a SQL prompt would be.
  sql = new Client({ connectionString: t.databaseUrl });
  await sql.connect();
  await eventually(async () => t.ctx.signedIn.remembering, Boolean, { what: 'the auth change listener to start' });
});
afterAll(async () => {
  await sql.end();
  await t.close();
});

const me = (token: string) => request(t.app).get('/api/v1/me').set(bearer(token));

/** Queries of the signed-in lookup sent while `work` runs. */
async function lookupsDuring(work: () => Promise<unknown>): Promise<number> {
  const spy = jest.spyOn(t.ctx.sequelize, 'query');
  try {
    await work();
    return spy.mock.calls.filter(([text]) => String(text).includes('JOIN sign_in_sessions')).length;
  } finally {
    spy.mockRestore();
  }
}

describe('who is signed in', () => {
  it('asks the database once for a run of requests from one sign-in', async () => {
    const s = await signUp(t.app);
    const asked = await lookupsDuring(async () => {
      for (let i = 0; i < 5; i++) await me(s.accessToken).expect(200);
    });
    expect(asked).toBe(1);
  });

  it('refuses a session revoked on another connection as soon as the change commits', async () => {
    const s = await signUp(t.app);
    await me(s.accessToken).expect(200);
    await sql.query(`UPDATE sign_in_sessions SET revoked_at = now(), revoked_reason = 'test' WHERE user_id = $1`, [s.user.id]);
    const res = await eventually(
      () => me(s.accessToken),
      (r) => r.status === 401,
      { what: 'the revoked session to be refused', timeoutMs: 5000, intervalMs: 10 },
    );
    expect(res.body.error.code).toBe('session_revoked');
  });

  it('shows a change to the user made elsewhere, and refuses a deleted user', async () => {
    const s = await signUp(t.app);
    await me(s.accessToken).expect(200);
    await sql.query('UPDATE users SET name = $2 WHERE id = $1', [s.user.id, 'Renamed Elsewhere']);
    await eventually(
      () => me(s.accessToken),
      (r) => r.body?.user?.name === 'Renamed Elsewhere',
      { what: 'the new name to show', timeoutMs: 5000, intervalMs: 10 },
    );
    await sql.query('DELETE FROM users WHERE id = $1', [s.user.id]);
    await eventually(
      () => me(s.accessToken),
      (r) => r.status === 401,
      { what: 'the deleted user to be refused', timeoutMs: 5000, intervalMs: 10 },
    );
  });

  it('refuses a session signed out through this server on the very next request', async () => {
    const s = await signUp(t.app);
    await me(s.accessToken).expect(200);
    await request(t.app).post('/api/v1/auth/signout').set('Cookie', s.cookie).set(bearer(s.accessToken)).expect(204);
    expect((await me(s.accessToken).expect(401)).body.error.code).toBe('session_revoked');
  });

  it('remembers nothing while it cannot listen, and still answers every request from the database', async () => {
    const other = await startTestApp();
    try {
      await eventually(async () => other.ctx.signedIn.remembering, Boolean, { what: 'the listener of the second app' });
      const s = await signUp(other.app);
      await other.ctx.signedIn.close();
      expect(other.ctx.signedIn.remembering).toBe(false);
      const spy = jest.spyOn(other.ctx.sequelize, 'query');
      for (let i = 0; i < 3; i++) await request(other.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(200);
      expect(spy.mock.calls.filter(([text]) => String(text).includes('JOIN sign_in_sessions'))).toHaveLength(3);
      spy.mockRestore();
    } finally {
      await other.close();
    }
  });
});
