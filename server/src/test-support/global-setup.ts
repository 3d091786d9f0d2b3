import { chmodSync, mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startLocalServices, type LocalServices } from '../../../infra/src/local-services';
import { freePort } from '../../../infra/src/port-check';
import { loadConfig } from '../config/config';
import { createDatabase } from '../db/database';
import { migrate } from '../db/migrator';

/**
 * Jest global set-up of the server suites: a throwaway PostgreSQL cluster (never the demo data),
 * maildev and the payment fake on free ports, and a migrated template database that each test
 * file clones (see test-app.ts).
 */
export default async function globalSetup(): Promise<void> {
  const root = mkdtempSync(path.join(os.tmpdir(), 'tumblewise-test-'));
  chmodSync(root, 0o755); // the postgres user must traverse it
  const services: LocalServices = await startLocalServices({
    ports: { postgres: await freePort(), smtp: await freePort(), mailWeb: await freePort(), payment: await freePort() },
    clusterDir: path.join(root, 'postgres'),
    mailDir: path.join(root, 'maildev'),
    throwaway: true,
    database: 'tw_template',
  });
  const env = {
    ...services.env,
    DATA_DIR: path.join(root, 'data'),
    TEST_ROOT: root,
    TEST_ADMIN_DATABASE_URL: services.cluster.url('postgres'),
    NODE_ENV: 'test',
  };
  const sequelize = createDatabase(services.env.DATABASE_URL);
  await migrate(sequelize);
  await sequelize.close();
  Object.assign(process.env, env);
  // Make sure secrets exist before workers race to create them.
  loadConfig({ ...process.env, ...env });
  writeFileSync(path.join(root, 'env.json'), JSON.stringify(env));
  (globalThis as { __TUMBLEWISE_SERVICES__?: LocalServices }).__TUMBLEWISE_SERVICES__ = services;
}
