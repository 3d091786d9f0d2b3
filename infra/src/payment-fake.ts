import express from 'express';
import type { Server } from 'node:http';
// The stateful payment-provider fake; its own CLI binds every interface, so it is embedded here.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExpressApp } = require('stripe-stateful-mock') as { createExpressApp: () => express.Express };

/**
 * Starts the local payment-provider fake on 127.0.0.1:port. Endpoints the fake lacks are added in
 * front of it (billing, a later issue) in the provider's documented shapes.
 */
export async function startPaymentFake(port: number): Promise<{ url: string; close: () => Promise<void> }> {
  const app = express();
  app.get('/healthz', (_req, res) => { res.json({ ok: true }); });
  app.use(createExpressApp());
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
  return {
    url: `http://127.0.0.1:${port}`,
    close: () => new Promise((resolve) => { server.closeAllConnections(); server.close(() => resolve()); }),
  };
}
