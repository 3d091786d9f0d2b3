import AxeBuilder from '@axe-core/playwright';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM_PATH } from '../../infra/src/chromium';

/** Screenshots are test artifacts (git-ignored). */
export const SCREENSHOT_DIR = path.resolve(__dirname, '../../test-results/screenshots');

/** A fresh headless Chromium profile (Debian's binary, no GPU, no background network). */
export async function openBrowser(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'tw-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    viewport: { width: 1280, height: 860 },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--enable-unsafe-swiftshader',
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  // Playwright starts catching file dialogs when the first 'filechooser' listener is added, and
  // does so asynchronously: a flow that adds it just before the click can lose the dialog to that
  // race. A listener from the start keeps the catching on for the whole flow.
  page.on('filechooser', () => undefined);
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/** Runs axe on the page and returns the violations (expected to be none). */
export async function accessibilityViolations(page: Page) {
  const result = await new AxeBuilder({ page } as never).analyze();
  return result.violations.map((v) => ({
    id: v.id,
    impact: v.impact,
    help: v.help,
    nodes: v.nodes.map((n) => n.target.join(' ')).slice(0, 5),
  }));
}

export const baseUrl = () => process.env.E2E_BASE_URL!;
