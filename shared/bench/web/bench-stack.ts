import { buildAppIfStale } from '../../../infra/src/app-build';
import { ensureChromium } from '../../../infra/src/chromium';
import globalSetup from '../../../test/support/e2e-global-setup';
import globalTeardown from '../../../test/support/e2e-global-teardown';

/** The running product the web benchmarks measure. */
export interface BenchStack {
  baseUrl: string;
  stop(): Promise<void>;
}

/**
 * Builds the designer app when its sources changed, makes sure Debian's Chromium is there, and
 * starts the throwaway stack of the browser flows: PostgreSQL, maildev and the payment fake on free
 * ports, and the server in its own process with the demo data seeded.
 */
export async function startBenchStack(): Promise<BenchStack> {
  ensureChromium();
  console.log(`[bench] designer app: ${buildAppIfStale('designer')}`);
  await globalSetup();
  return { baseUrl: process.env.E2E_BASE_URL!, stop: () => globalTeardown() };
}
