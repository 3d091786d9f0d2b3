import { startServer } from '../../server/src/main';
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE } from '../../server/src/seed/demo-seed';
import { buildAppIfStale } from './app-build';
import { startLocalServices } from './local-services';
import { assertPortFree } from './port-check';

const num = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

/** `npm start`: local services, migrations, the demo seed, the built apps and the server. */
async function main(): Promise<void> {
  const port = num('PORT', 4300);
  await assertPortFree(port, 'the Tumblewise server', 'PORT');
  const services = await startLocalServices({
    ports: {
      postgres: num('TUMBLEWISE_PG_PORT', 54329),
      smtp: num('SMTP_PORT', 4325),
      mailWeb: num('MAIL_WEB_PORT', 4380),
      payment: num('PAYMENT_PORT', 4390),
    },
    database: 'tumblewise',
    webhookUrl: `http://127.0.0.1:${port}/api/v1/billing/webhook`,
  });
  let stopping = false;
  const stopServices = async () => {
    if (!stopping) {
      stopping = true;
      await services.stop();
    }
  };
  try {
    console.log(
      services.clusterState === 'reused'
        ? '[postgres] reusing the existing database cluster and its data'
        : '[postgres] created a new database cluster',
    );
    for (const app of ['designer', 'admin'] as const) buildAppIfStale(app);
    Object.assign(process.env, services.env, { PORT: String(port) });
    const { ctx, stop, applied, seeded } = await startServer({ seedDemo: true });
    const url = ctx.config.publicUrl;
    console.log(`
Tumblewise is running.
  Designer app   ${url}/
  Admin app      ${url}/admin/
  API            ${url}/api/v1   (description: ${url}/api/v1/docs)
  Mail inbox     ${services.mail.inboxUrl}
  Payment fake   ${services.paymentUrl}
  Migrations     ${applied.length ? `applied ${applied.length}` : 'none pending'}
  Demo data      ${seeded ? `seeded "${DEMO_WORKSPACE}"` : `"${DEMO_WORKSPACE}" already there (reused)`}

Demo sign-ins (password for all: ${DEMO_PASSWORD}):
${DEMO_USERS.map((u) => `  ${(u.role ?? 'operator').padEnd(9)} ${u.email}`).join('\n')}

Press Ctrl-C to stop everything.`);
    const shutdown = async () => {
      console.log('\nStopping …');
      await stop();
      await stopServices();
      console.log('Stopped the server, the mail server, the payment fake and PostgreSQL.');
      process.exit(0);
    };
    process.once('SIGINT', () => void shutdown());
    process.once('SIGTERM', () => void shutdown());
  } catch (err) {
    await stopServices();
    throw err;
  }
}

main().catch((err) => {
  console.error(`\nCould not start: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
