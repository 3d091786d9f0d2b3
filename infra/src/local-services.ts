import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { storedSecret } from '../../server/src/config/secret-store';
import { MailCatcher } from './mail-catcher';
import { startPaymentFake } from './payment-fake';
import { clusterParentDir, dataDir } from './paths';
import { assertPortFree } from './port-check';
import { PostgresCluster } from './postgres-cluster';

export interface LocalServicePorts {
  postgres: number;
  smtp: number;
  mailWeb: number;
  payment: number;
}

export interface LocalServices {
  cluster: PostgresCluster;
  mail: MailCatcher;
  paymentUrl: string;
  /** Environment the server reads to reach these services. */
  env: Record<string, string>;
  /** What happened to the database cluster: created now, or reused from an earlier run. */
  clusterState: 'created' | 'reused';
  stop(): Promise<void>;
}

/**
 * Starts PostgreSQL (a cluster of our own under the data folder), maildev and the payment fake,
 * each on 127.0.0.1. `clusterDir` defaults to the demo cluster; tests pass a throwaway one.
 */
export async function startLocalServices(options: {
  ports: LocalServicePorts;
  clusterDir?: string;
  mailDir?: string;
  throwaway?: boolean;
  database: string;
  /** Where the payment fake delivers provider events (the server's webhook route). */
  webhookUrl?: string;
}): Promise<LocalServices> {
  const { ports } = options;
  const data = dataDir();
  const password = storedSecret(data, 'postgresPassword');
  const webhookSecret = storedSecret(data, 'paymentWebhookSecret', () => `whsec_${randomBytes(24).toString('base64url')}`);
  const cluster = new PostgresCluster({
    dataDir: options.clusterDir ?? path.join(clusterParentDir(), 'postgres'),
    port: ports.postgres,
    user: 'tumblewise',
    password,
    throwaway: options.throwaway,
  });
  const clusterState = cluster.ensureInitialised();
  if (!cluster.isRunning()) await assertPortFree(ports.postgres, 'PostgreSQL', 'TUMBLEWISE_PG_PORT');
  await assertPortFree(ports.smtp, 'the mail server (SMTP)', 'SMTP_PORT');
  await assertPortFree(ports.mailWeb, 'the mail inbox', 'MAIL_WEB_PORT');
  await assertPortFree(ports.payment, 'the payment fake', 'PAYMENT_PORT');

  const mail = new MailCatcher({ smtpPort: ports.smtp, webPort: ports.mailWeb, mailDir: options.mailDir ?? path.join(data, 'maildev') });
  let payment: Awaited<ReturnType<typeof startPaymentFake>> | null = null;
  try {
    cluster.start();
    await createDatabaseIfMissing(cluster.url('postgres'), options.database);
    await mail.start();
    payment = await startPaymentFake(ports.payment, { webhookUrl: options.webhookUrl, webhookSecret });
  } catch (err) {
    // Leave nothing running behind a failed start.
    await mail.stop().catch(() => undefined);
    try {
      cluster.stop();
    } catch {
      /* already down */
    }
    throw err;
  }
  const started = payment;

  return {
    cluster,
    mail,
    paymentUrl: started.url,
    clusterState,
    env: {
      DATABASE_URL: cluster.url(options.database),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(ports.smtp),
      MAIL_INBOX_URL: mail.inboxUrl,
      PAYMENT_API_URL: started.url,
      PAYMENT_WEBHOOK_SECRET: webhookSecret,
      DATA_DIR: data,
    },
    stop: async () => {
      await started.close();
      await mail.stop();
      cluster.stop();
    },
  };
}

/** CREATE DATABASE when it is not there yet. */
export async function createDatabaseIfMissing(adminUrl: string, database: string): Promise<void> {
  const { Client } = await import('pg');
  const client = new Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const found = await client.query('select 1 from pg_database where datname = $1', [database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${database.replace(/"/g, '')}"`);
  } finally {
    await client.end();
  }
}
