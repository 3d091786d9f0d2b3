import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, screenshot } from './browser';

/** The demo password of every Kestrel Bay sign-in (invented demo data, server/src/seed). */
export const DEMO_PASSWORD = 'kestrel-demo-2026';

export const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

/** Screenshot, then axe on the whole page: no violations. */
export async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

/** Calls the API directly (JSON in and out); a non-2xx answer throws with its body. */
export async function api<T>(path: string, token: string | null, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const method = init.method ?? (init.body ? 'POST' : 'GET');
  const res = await fetch(`${baseUrl()}/api/v1${path}`, {
    method,
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: init.body ? JSON.stringify(init.body) : undefined,
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
  return (text ? JSON.parse(text) : null) as T;
}

/** Signs in through the sign-in page and waits for the signed-in shell. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${baseUrl()}/signin`);
  await byTestId(page, 'signin-email').fill(email);
  await byTestId(page, 'signin-password').fill(password);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'user-menu').waitFor();
}

/** The canvas's pixels as a data URL, read after the next two animation frames have been drawn. */
export function canvasPixels(page: Page, testId: string): Promise<string> {
  return page.evaluate(async (id) => {
    await new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve())));
    const canvas = document.querySelector<HTMLCanvasElement>(`[data-testid="${id}"]`);
    if (!canvas) throw new Error(`no canvas ${id}`);
    return canvas.toDataURL('image/png');
  }, testId);
}

/** Share of sampled pixels that differ from the corner's colour: the picture is more than an empty clear. */
export function drawnShare(page: Page, testId: string): Promise<number> {
  return page.evaluate((id) => {
    const source = document.querySelector<HTMLCanvasElement>(`[data-testid="${id}"]`)!;
    const copy = document.createElement('canvas');
    copy.width = source.width;
    copy.height = source.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(source, 0, 0);
    const data = ctx.getImageData(0, 0, copy.width, copy.height).data;
    const [r0, g0, b0] = [data[0], data[1], data[2]];
    let differing = 0,
      total = 0;
    for (let i = 0; i < data.length; i += 4 * 97) {
      total++;
      if (Math.abs(data[i] - r0) + Math.abs(data[i + 1] - g0) + Math.abs(data[i + 2] - b0) > 24) differing++;
    }
    return differing / total;
  }, testId);
}
