// Installs the npm packages when node_modules is missing or older than package-lock.json.
// Plain CommonJS with no dependencies: it runs before anything is installed.
const { existsSync, statSync } = require('node:fs');
const { spawnSync } = require('node:child_process');
const path = require('node:path');

const root = path.resolve(__dirname, '../..');

function ensureInstall() {
  const lock = path.join(root, 'package-lock.json');
  const marker = path.join(root, 'node_modules', '.package-lock.json');
  const stale = !existsSync(marker) || statSync(marker).mtimeMs < statSync(lock).mtimeMs;
  if (!stale) return;
  console.log('[setup] installing npm packages (npm ci) …');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('[setup] npm ci failed; see the output above.');
    process.exit(result.status ?? 1);
  }
}

module.exports = { ensureInstall, root };
