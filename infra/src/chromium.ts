import { existsSync } from 'node:fs';
import { ensureDebianPackage } from './debian-package';

/** Debian's Chromium, the only browser the browser tests use (never a downloaded one). */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export function ensureChromium(): string {
  ensureDebianPackage(() => existsSync(CHROMIUM_PATH), 'chromium', 'Chromium');
  return CHROMIUM_PATH;
}
