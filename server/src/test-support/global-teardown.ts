import { rmSync } from 'node:fs';
import type { LocalServices } from '../../../infra/src/local-services';

/** Stops the test services and deletes the throwaway cluster. */
export default async function globalTeardown(): Promise<void> {
  const services = (globalThis as { __TUMBLEWISE_SERVICES__?: LocalServices }).__TUMBLEWISE_SERVICES__;
  if (!services) return;
  await services.stop();
  if (process.env.TEST_ROOT) rmSync(process.env.TEST_ROOT, { recursive: true, force: true });
}
