import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { buildAppIfStale } from './app-build';
import { ensureChromium } from './chromium';
import { projectRoot } from './paths';

/**
 * `npm test`: type-checks, then runs every suite — shared and server (jest against real
 * PostgreSQL, maildev and the payment fake), the Angular unit tests (jest, jsdom), and the
 * browser flows (jest + playwright-core in Debian's Chromium) — and ends with a summary.
 * Every step runs even when an earlier one failed; the exit code is non-zero on any failure.
 */
interface Step {
  name: string;
  run: () => boolean;
}

const bin = (pkg: string, file: string) => path.join(projectRoot, 'node_modules', pkg, file);
const node = (args: string[], env: Record<string, string> = {}) =>
  spawnSync(process.execPath, args, { cwd: projectRoot, stdio: 'inherit', env: { ...process.env, ...env } }).status === 0;
const jest = (config: string, extra: string[] = []) => node([bin('jest', 'bin/jest.js'), '-c', config, '--ci', ...extra]);
const extraArgs = process.argv.slice(2);

const steps: Step[] = [
  { name: 'lint (ESLint: typescript-eslint, angular-eslint)', run: () => node([bin('eslint', 'bin/eslint.js'), '.', '--quiet']) },
  { name: 'format check (Prettier)', run: () => node([bin('prettier', 'bin/prettier.cjs'), '--check', '.', '--log-level', 'warn']) },
  { name: 'type-check (shared, server, infra)', run: () => node([bin('typescript', 'bin/tsc'), '-p', 'tsconfig.json', '--noEmit']) },
  { name: 'type-check (browser flows)', run: () => node([bin('typescript', 'bin/tsc'), '-p', 'test/tsconfig.json', '--noEmit']) },
  {
    name: 'type-check (designer app, templates)',
    run: () => node([bin('@angular/compiler-cli', 'bundles/src/bin/ngc.js'), '-p', 'apps/designer/tsconfig.app.json', '--noEmit']),
  },
  {
    name: 'type-check (admin app, templates)',
    run: () => node([bin('@angular/compiler-cli', 'bundles/src/bin/ngc.js'), '-p', 'apps/admin/tsconfig.app.json', '--noEmit']),
  },
  {
    name: 'type-check (Angular unit tests)',
    run: () =>
      ['apps/designer', 'apps/admin', 'libs/ui', 'libs/api-client', 'libs/viewer'].every((dir) =>
        node([bin('typescript', 'bin/tsc'), '-p', `${dir}/tsconfig.spec.json`, '--noEmit']),
      ),
  },
  { name: 'shared and server suites (jest)', run: () => jest('jest.config.js', extraArgs) },
  { name: 'Angular unit tests (jest, jsdom)', run: () => jest('jest.angular.config.js', extraArgs) },
  {
    name: 'browser flows (Chromium via playwright-core)',
    run: () => {
      try {
        ensureChromium();
        for (const app of ['designer', 'admin'] as const) buildAppIfStale(app);
      } catch (err) {
        console.error(err instanceof Error ? err.message : err);
        return false;
      }
      return jest('jest.e2e.config.js', extraArgs);
    },
  },
];

const results: { name: string; ok: boolean; seconds: number }[] = [];
for (const step of steps) {
  console.log(`\n━━ ${step.name} ━━`);
  const started = Date.now();
  const ok = step.run();
  results.push({ name: step.name, ok, seconds: (Date.now() - started) / 1000 });
}

console.log('\n━━ Summary ━━');
for (const r of results) console.log(`  ${r.ok ? 'PASS' : 'FAIL'}  ${r.name}  (${r.seconds.toFixed(1)} s)`);
const failed = results.filter((r) => !r.ok).length;
console.log(failed ? `\n${failed} of ${results.length} steps failed.` : `\nAll ${results.length} steps passed.`);
process.exit(failed ? 1 : 0);
