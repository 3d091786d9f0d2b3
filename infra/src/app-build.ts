import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { projectRoot } from './paths';

/** Newest modification time of any file under the folders (node_modules and dist skipped). */
function newestMtime(dirs: string[]): number {
  let newest = 0;
  const walk = (dir: string) => {
    if (!existsSync(dir)) return;
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      if (entry.name === 'node_modules' || entry.name === 'dist' || entry.name.startsWith('.')) continue;
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else newest = Math.max(newest, statSync(full).mtimeMs);
    }
  };
  dirs.forEach(walk);
  return newest;
}

/** Builds an app with the Angular CLI when its output is missing or older than its sources. */
export function buildAppIfStale(app: 'designer' | 'admin', force = false): 'built' | 'up to date' {
  const index = path.join(projectRoot, 'dist', app, 'browser', 'index.html');
  const sources = ['apps/' + app, 'libs', 'shared/src', 'angular.json', 'tsconfig.base.json', 'package-lock.json'].map((p) =>
    path.join(projectRoot, p),
  );
  const srcTime = Math.max(
    newestMtime(sources.filter((s) => statSafe(s)?.isDirectory())),
    ...sources.map((s) => (statSafe(s)?.isFile() ? statSafe(s)!.mtimeMs : 0)),
  );
  if (!force && existsSync(index) && statSync(index).mtimeMs >= srcTime) return 'up to date';
  console.log(`[build] building the ${app} app …`);
  const result = spawnSync(process.execPath, [path.join(projectRoot, 'node_modules/@angular/cli/bin/ng.js'), 'build', app], {
    cwd: projectRoot,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) throw new Error(`Building the ${app} app failed (see above).`);
  return 'built';
}

function statSafe(p: string) {
  try {
    return statSync(p);
  } catch {
    return null;
  }
}
