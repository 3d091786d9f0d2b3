import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/**
 * Installs a Debian package with apt-get when `probe` (a file it provides) is missing.
 * Needs root; otherwise stops with the command to run.
 */
export function ensureDebianPackage(probe: string | (() => boolean), pkg: string, what: string): void {
  const present = typeof probe === 'string' ? existsSync(probe) : probe();
  if (present) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`${what} is not installed. Install it with: sudo apt-get install -y ${pkg}`);
  }
  console.log(`[setup] installing ${what} from Debian's packages (apt-get install ${pkg}) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  let result = spawnSync('apt-get', ['install', '-y', '--no-install-recommends', pkg], { stdio: 'inherit', env });
  if (result.status !== 0) {
    spawnSync('apt-get', ['update'], { stdio: 'inherit', env });
    result = spawnSync('apt-get', ['install', '-y', '--no-install-recommends', pkg], { stdio: 'inherit', env });
  }
  if (result.status !== 0) throw new Error(`apt-get install ${pkg} failed`);
}
