import { createApp } from './app';
import { loadConfig } from './config/config';
import { closeContext, createContext } from './create-context';
import { migrate } from './db/migrator';
import { seedDemo } from './seed/demo-seed';

/**
 * Starts one server process: migrate, seed the demo workspace when asked (SEED_DEMO=true), listen.
 * Resolves with a `stop` function. `npm start` calls this after starting the local services;
 * a deployment runs `tsx server/src/main.ts` with its own environment.
 */
export async function startServer(options: { seedDemo?: boolean } = {}) {
  const config = loadConfig();
  const ctx = createContext(config);
  const applied = await migrate(ctx.sequelize);
  const seeded = options.seedDemo ? await seedDemo(ctx) : null;
  const app = createApp(ctx);
  const server = await new Promise<import('node:http').Server>((resolve, reject) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
    s.once('error', reject);
  });
  // The background-job worker starts after the port is open; studies queue meanwhile.
  ctx.scatter.start().catch((err) => ctx.logger.error({ err }, 'the background-job worker did not start'));
  return {
    ctx,
    server,
    applied,
    seeded,
    stop: async () => {
      await new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      });
      await closeContext(ctx);
    },
  };
}

if (require.main === module) {
  startServer({ seedDemo: process.env.SEED_DEMO === 'true' })
    .then(({ ctx, stop }) => {
      ctx.logger.info(`Tumblewise listening on ${ctx.config.publicUrl}`);
      const shutdown = () => {
        void stop().then(() => process.exit(0));
      };
      process.once('SIGINT', shutdown);
      process.once('SIGTERM', shutdown);
    })
    .catch((err) => {
      console.error(err instanceof Error ? err.message : err);
      process.exit(1);
    });
}
