import { rmSync } from 'node:fs';
import type { E2eRunning } from './e2e-global-setup';

export default async function globalTeardown(): Promise<void> {
  const running = (globalThis as { __E2E__?: E2eRunning }).__E2E__;
  if (!running) return;
  await new Promise((resolve) => {
    if (running.server.exitCode !== null) return resolve(null);
    running.server.once('exit', resolve);
    running.server.kill('SIGTERM');
  });
  await running.services.stop();
  rmSync(running.root, { recursive: true, force: true });
}
