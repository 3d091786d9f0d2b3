import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

/** The checkout's top folder. */
export const projectRoot = path.resolve(__dirname, '../..');

/** True when the unprivileged postgres user can reach `dir` (every parent must be traversable). */
export function postgresCanReach(dir: string): boolean {
  if (process.getuid?.() !== 0) return true; // not root: PostgreSQL runs as ourselves
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

/**
 * The git-ignored data folder (`.data/` in the checkout). When the checkout sits under a folder the
 * postgres user cannot traverse (a 0700 home), the database cluster goes under /var/tmp instead.
 */
export function dataDir(): string {
  const dir = process.env.TUMBLEWISE_DATA_DIR ?? path.join(projectRoot, '.data');
  mkdirSync(dir, { recursive: true });
  return dir;
}

/** Folder for a PostgreSQL cluster of the given name, reachable by the postgres user. */
export function clusterParentDir(): string {
  const preferred = dataDir();
  if (postgresCanReach(preferred)) return preferred;
  const hash = createHash('sha256').update(projectRoot).digest('hex').slice(0, 10);
  const fallback = path.join('/var/tmp', `tumblewise-${hash}`);
  mkdirSync(fallback, { recursive: true });
  console.log(`[postgres] ${preferred} is not reachable by the postgres user; keeping the cluster in ${fallback}`);
  return fallback;
}
