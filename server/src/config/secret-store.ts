import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Secrets that were not given in the environment are generated once and kept in
 * `<dataDir>/secrets.json` (git-ignored, mode 0600), so restarts keep sessions valid.
 */
export function storedSecret(dataDir: string, name: string, make: () => string = () => randomBytes(48).toString('base64url')): string {
  const file = path.join(dataDir, 'secrets.json');
  const secrets: Record<string, string> = existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {};
  if (!secrets[name]) {
    secrets[name] = make();
    mkdirSync(dataDir, { recursive: true });
    writeFileSync(file, JSON.stringify(secrets, null, 2) + '\n', { mode: 0o600 });
  }
  return secrets[name];
}
