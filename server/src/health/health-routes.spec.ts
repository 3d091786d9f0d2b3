import path from 'node:path';
import request from 'supertest';
import { createDatabaseIfMissing } from '../../../infra/src/local-services';
import { freePort } from '../../../infra/src/port-check';
import { PostgresCluster } from '../../../infra/src/postgres-cluster';
import { createApp } from '../app';
import { loadConfig } from '../config/config';
import { closeContext, createContext } from '../create-context';
import { migrate } from '../db/migrator';
import { signUp, startTestApp } from '../test-support/test-app';

describe('GET /health', () => {
  it('reports the database, the mail server and the payment fake as up', async () => {
    const t = await startTestApp();
    try {
      const res = await request(t.app).get('/api/v1/health').expect(200);
      expect(res.body).toMatchObject({ status: 'ok', database: 'up', mail: 'up', payment: 'up' });
    } finally {
      await t.close();
    }
  });

  it('says degraded when the mail server and the payment fake do not answer', async () => {
    const t = await startTestApp({ SMTP_PORT: String(await freePort()), PAYMENT_API_URL: `http://127.0.0.1:${await freePort()}` });
    try {
      const res = await request(t.app).get('/api/v1/health').expect(200);
      expect(res.body).toMatchObject({ status: 'degraded', database: 'up', mail: 'down', payment: 'down' });
    } finally {
      await t.close();
    }
  });
});

describe('GET /health/live', () => {
  it('answers alive without asking the mail server or the payment fake', async () => {
    // Both services point at ports nothing listens on: the full check says degraded, liveness does not care.
    const t = await startTestApp({ SMTP_PORT: String(await freePort()), PAYMENT_API_URL: `http://127.0.0.1:${await freePort()}` });
    try {
      const res = await request(t.app).get('/api/v1/health/live').expect(200);
      expect(res.body).toEqual({ status: 'alive' });
      expect(res.headers['cache-control']).toBe('no-store');
      const full = await request(t.app).get('/api/v1/health').expect(200);
      expect(full.body.status).toBe('degraded');
    } finally {
      await t.close();
    }
  });
});

describe('PostgreSQL stopped and started again', () => {
  // A cluster of this test's own, so stopping it disturbs no other suite.
  const cluster = new PostgresCluster({
    dataDir: path.join(process.env.TEST_ROOT!, `pg-outage-${process.pid}`),
    port: 0,
    user: 'tumblewise',
    password: 'outage-test-password',
    throwaway: true,
  });

  afterAll(() => cluster.destroy());

  it('answers 503 with a clear error while the database is down, and recovers by itself', async () => {
    (cluster.options as { port: number }).port = await freePort();
    cluster.ensureInitialised();
    cluster.start();
    await createDatabaseIfMissing(cluster.url('postgres'), 'outage');
    const ctx = createContext(loadConfig({ ...process.env, DATABASE_URL: cluster.url('outage') }));
    try {
      await migrate(ctx.sequelize);
      const app = createApp(ctx);
      const owner = await signUp(app);
      await request(app).get('/api/v1/health').expect(200);

      cluster.stop();
      const health = await request(app).get('/api/v1/health').expect(503);
      expect(health.body).toMatchObject({ status: 'unavailable', database: 'down', error: { code: 'database_unavailable' } });
      expect(health.headers['retry-after']).toBe('5');
      // The process itself is still alive: the liveness route does not ask the database.
      await request(app).get('/api/v1/health/live').expect(200, { status: 'alive' });
      const signin = await request(app).post('/api/v1/auth/signin').send({ email: owner.user.email, password: owner.password }).expect(503);
      expect(signin.body.error).toEqual({ code: 'database_unavailable', message: expect.stringMatching(/database is not reachable/) });

      cluster.start();
      let status = 0;
      for (let i = 0; i < 50 && status !== 200; i++) {
        status = (await request(app).get('/api/v1/health')).status;
        if (status !== 200) await new Promise((r) => setTimeout(r, 100));
      }
      expect(status).toBe(200);
      await request(app).post('/api/v1/auth/signin').send({ email: owner.user.email, password: owner.password }).expect(200);
    } finally {
      await closeContext(ctx);
    }
  });
});
