import type { Page } from 'playwright-core';
import { editorBenchPart } from '../bench-part';

/** The demo designer of the seeded Kestrel Bay workspace (invented). */
export const DEMO_DESIGNER = { email: 'designer@kestrelbay.test', password: 'kestrel-demo-2026' };

export interface ApiSession {
  token: string;
  workspaceId: string;
}

async function call<T>(baseUrl: string, method: string, path: string, body?: unknown, token?: string): Promise<T> {
  const res = await fetch(`${baseUrl}/api/v1${path}`, {
    method,
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
  return JSON.parse(text) as T;
}

/** Signs the demo designer in through the API. */
export async function signInDesigner(baseUrl: string): Promise<ApiSession> {
  const session = await call<{ accessToken: string; memberships: { workspace: { id: string } }[] }>(
    baseUrl,
    'post',
    '/auth/signin',
    DEMO_DESIGNER,
  );
  const workspaceId = session.memberships[0]?.workspace.id;
  if (!workspaceId) throw new Error('the demo designer belongs to no workspace (was the demo data seeded?)');
  return { token: session.accessToken, workspaceId };
}

/** Creates a project with the 50-primitive bench part as the part's draft; returns the editor's path. */
export async function createBenchPart(baseUrl: string, s: ApiSession): Promise<string> {
  const project = await call<{ id: string }>(
    baseUrl,
    'post',
    `/workspaces/${s.workspaceId}/projects`,
    { name: `Bench ${Date.now().toString(36)}`, category: 'other' },
    s.token,
  );
  const part = await call<{ id: string }>(
    baseUrl,
    'post',
    `/workspaces/${s.workspaceId}/projects/${project.id}/parts`,
    { name: 'Bench plate', draft: editorBenchPart() },
    s.token,
  );
  return `/projects/${project.id}/parts/${part.id}`;
}

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

/** Signs the demo designer in through the sign-in page and waits for the projects table. */
export async function signInInBrowser(page: Page, baseUrl: string): Promise<void> {
  if (!page.url().endsWith('/signin')) await page.goto(`${baseUrl}/signin`);
  await byTestId(page, 'signin-email').fill(DEMO_DESIGNER.email);
  await byTestId(page, 'signin-password').fill(DEMO_DESIGNER.password);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'project-table').waitFor();
}
