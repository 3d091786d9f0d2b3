import { spawn, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startLocalServices, type LocalServices } from '../../infra/src/local-services';
import { freePort, waitForPort } from '../../infra/src/port-check';

export type E2eRunning = { services: LocalServices; server: ChildProcess; root: string };
const projectRoot = path.resolve(__dirname, '../..');

/**
 * Starts a throwaway PostgreSQL cluster, maildev and the payment fake, then the server (its own
 * process, as in production) serving the built apps on a free port, seeded with the demo data.
 * Exposes E2E_BASE_URL and MAIL_INBOX_URL to the flows.
 */
export default async function globalSetup(): Promise<void> {
  const root = mkdtempSync(path.join(os.tmpdir(), 'tumblewise-e2e-'));
  chmodSync(root, 0o755);
  const port = await freePort();
  const services = await startLocalServices({
    ports: { postgres: await freePort(), smtp: await freePort(), mailWeb: await freePort(), payment: await freePort() },
    clusterDir: path.join(root, 'postgres'),
    mailDir: path.join(root, 'maildev'),
    throwaway: true,
    database: 'tumblewise_e2e',
    webhookUrl: `http://127.0.0.1:${port}/api/v1/billing/webhook`,
  });
  const env = {
    ...process.env,
    ...services.env,
    DATA_DIR: path.join(root, 'data'),
    PORT: String(port),
    NODE_ENV: 'test',
    BCRYPT_COST: '4',
    LOG_LEVEL: 'warn',
    SEED_DEMO: 'true',
    RATE_LIMIT_SIGNIN: '1000',
    RATE_LIMIT_SIGNUP: '1000',
    RATE_LIMIT_PASSWORD_RESET: '1000',
  };
  const server = spawn(
    process.execPath,
    [path.join(projectRoot, 'node_modules/tsx/dist/cli.mjs'), path.join(projectRoot, 'server/src/main.ts')],
    {
      cwd: projectRoot,
      env,
      stdio: ['ignore', 'inherit', 'inherit'],
    },
  );
  try {
    await waitForPort(port, 30000);
  } catch (err) {
    server.kill('SIGKILL');
    await services.stop();
    throw err;
  }
  process.env.E2E_BASE_URL = `http://127.0.0.1:${port}`;
  process.env.MAIL_INBOX_URL = services.mail.inboxUrl;
  process.env.PAYMENT_API_URL = services.paymentUrl;
  (globalThis as { __E2E__?: E2eRunning }).__E2E__ = { services, server, root };
}
