import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';
import { mailsTo, waitForMail } from '../../server/src/test-support/mail-inbox';

/**
 * The design loop on screen: a designer's part with two saved variants (made through the API so the
 * flow does not depend on the editor's forms), the tumble preview played in the 3-D view (its canvas
 * must change between frames), the two variants compared, a spin report downloaded as PDF, a short
 * scatter study run, a review
 * asked for; then the demo reviewer opens the link from the e-mail in a second browser and approves.
 * Every screen is screenshotted and checked with axe.
 */
const DEMO_PASSWORD = 'kestrel-demo-2026';
const DESIGNER = 'designer@kestrelbay.test';
const REVIEWER = 'reviewer@kestrelbay.test';
const stamp = Date.now().toString(36);

// An invented practice racket: grip with a bore, throat, hoop and a taped point mass. Spinning it
// about x (in the face) is about its intermediate axis: flip-prone; about y (the face normal) is
// about its major axis: steady.
const racket = (axis: [number, number, number]) => ({
  name: `Practice racket ${stamp}`,
  category: 'racket',
  primitives: [
    { id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, position: [0, 0, 0.095], density: 650 },
    { id: 'bore', shape: 'cylinder', radius: 0.008, length: 0.17, position: [0, 0, 0.095], density: 650, mode: 'remove' },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
    { id: 'hoop', shape: 'torus', majorRadius: 0.11, minorRadius: 0.008, position: [0, 0, 0.42], rotationDeg: [90, 0, 0], density: 1500 },
    { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.42] },
  ],
  spin: { axis, rate: 31.4 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
});

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

async function api<T>(path: string, token: string | null, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(`${baseUrl()}/api/v1${path}`, {
    method: init.method ?? (init.body ? 'POST' : 'GET'),
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: init.body ? JSON.stringify(init.body) : undefined,
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${init.method ?? 'POST'} ${path} answered ${res.status}: ${text}`);
  return (text ? JSON.parse(text) : null) as T;
}

async function signIn(page: Page, email: string): Promise<void> {
  await page.goto(`${baseUrl()}/signin`);
  await byTestId(page, 'signin-email').fill(email);
  await byTestId(page, 'signin-password').fill(DEMO_PASSWORD);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'user-menu').waitFor();
}

/**
 * The sign-off panel of variant `number` on a part editor opened at `?variant=…&panel=review` (the
 * review e-mail's link): the variant's report is already open and its sign-off loads in view.
 */
async function linkedSignOff(page: Page, number: number) {
  await page.locator(`[data-testid="variant-row"][data-variant-number="${number}"] [data-testid="variant-open"][aria-pressed="true"]`).waitFor();
  const panel = byTestId(page, 'sign-off-panel');
  await panel.locator('[data-testid="status-chip"]').waitFor();
  return panel;
}

/** The canvas's pixels as a data URL, read after the next two animation frames have been drawn. */
function canvasPixels(page: Page, testId: string): Promise<string> {
  return page.evaluate(async (id) => {
    await new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve())));
    const canvas = document.querySelector<HTMLCanvasElement>(`[data-testid="${id}"]`);
    if (!canvas) throw new Error(`no canvas ${id}`);
    return canvas.toDataURL('image/png');
  }, testId);
}

/** Share of sampled pixels that are not the background: the picture is more than an empty clear. */
function drawnShare(page: Page, testId: string): Promise<number> {
  return page.evaluate((id) => {
    const source = document.querySelector<HTMLCanvasElement>(`[data-testid="${id}"]`)!;
    const copy = document.createElement('canvas');
    copy.width = source.width;
    copy.height = source.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(source, 0, 0);
    const data = ctx.getImageData(0, 0, copy.width, copy.height).data;
    const [r0, g0, b0] = [data[0], data[1], data[2]];
    let differing = 0, total = 0;
    for (let i = 0; i < data.length; i += 4 * 97) {
      total++;
      if (Math.abs(data[i] - r0) + Math.abs(data[i + 1] - g0) + Math.abs(data[i + 2] - b0) > 24) differing++;
    }
    return differing / total;
  }, testId);
}

let designerBrowser: Awaited<ReturnType<typeof openBrowser>>;
let reviewerBrowser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => { designerBrowser = await openBrowser(); reviewerBrowser = await openBrowser(); });
afterAll(async () => { await designerBrowser?.close(); await reviewerBrowser?.close(); });

it('plays the tumble preview, compares two variants, downloads a PDF, and gets a sign-off', async () => {
  // Data through the API, as the designer.
  const session = await api<{ accessToken: string; memberships: { workspace: { id: string; name: string } }[] }>('/auth/signin', null, { body: { email: DESIGNER, password: DEMO_PASSWORD } });
  const token = session.accessToken;
  const ws = session.memberships.find((m) => m.workspace.name === 'Kestrel Bay Sports Lab')!.workspace.id;
  const project = await api<{ id: string }>(`/workspaces/${ws}/projects`, token, { body: { name: `Tumble flow ${stamp}`, category: 'racket' } });
  const part = await api<{ id: string }>(`/workspaces/${ws}/projects/${project.id}/parts`, token, { body: { name: `Practice racket ${stamp}`, draft: racket([1, 0, 0]) } });
  const v1 = await api<{ id: string; report: { spin: { verdict: string } } }>(`/workspaces/${ws}/parts/${part.id}/variants`, token, { body: { label: 'face spin', document: racket([1, 0, 0]) } });
  const v2 = await api<{ id: string; report: { spin: { verdict: string } } }>(`/workspaces/${ws}/parts/${part.id}/variants`, token, { body: { label: 'normal spin', document: racket([0, 1, 0]) } });
  expect([v1.report.spin.verdict, v2.report.spin.verdict]).toEqual(['flip-prone', 'steady']);
  const partPath = `${baseUrl()}/projects/${project.id}/parts/${part.id}`;

  // The tumble preview in the part editor.
  const page = designerBrowser.page;
  await signIn(page, DESIGNER);
  await page.goto(`${partPath}?variant=${v1.id}`);
  const canvas = byTestId(page, 'viewer-canvas');
  await canvas.scrollIntoViewIfNeeded();
  await byTestId(page, 'tumble-play').and(page.locator(':not([disabled])')).waitFor();
  await byTestId(page, 'omega-chart').locator('svg').first().waitFor();
  await screenshot(page, '10-part-editor-tumble-paused');
  // Something is drawn over the background (the thin racket and its axes cover a few per cent of the view).
  expect(await drawnShare(page, 'viewer-canvas')).toBeGreaterThan(0.005);
  expect(await byTestId(page, 'tumble-summary').innerText()).toContain('Verdict: flip-prone');
  await expectAccessible(page, '10-part-editor-tumble-paused');
  const still = await canvasPixels(page, 'viewer-canvas');
  await byTestId(page, 'tumble-play').click();
  await byTestId(page, 'tumble-pause').waitFor();
  const first = await canvasPixels(page, 'viewer-canvas');
  const second = await canvasPixels(page, 'viewer-canvas');
  expect(first).not.toBe(still);
  expect(second).not.toBe(first);
  const polhodeA = await canvasPixels(page, 'polhode-canvas');
  const polhodeB = await canvasPixels(page, 'polhode-canvas');
  expect(polhodeB).not.toBe(polhodeA);
  await screenshot(page, '11-part-editor-tumble-playing');
  await byTestId(page, 'tumble-pause').click();
  await byTestId(page, 'view-top').click();
  await byTestId(page, 'tumble-play').waitFor();

  // Compare the two variants and download a spin report.
  await page.goto(`${partPath}/compare?variants=${v1.id},${v2.id}&baseline=${v1.id}`);
  await byTestId(page, 'compare-table').waitFor();
  await byTestId(page, 'compare-chart').locator('svg').first().waitFor();
  const verdicts = await byTestId(page, 'compare-row-verdict').locator('td').allInnerTexts();
  expect(verdicts.map((t) => t.trim())).toEqual(['flip-prone', 'steady']);
  expect(await byTestId(page, 'compare-row-mass').locator('td').nth(1).innerText()).toMatch(/±0 g/);
  await expectAccessible(page, '12-compare-two-variants');
  const [pdf] = await Promise.all([page.waitForEvent('download'), byTestId(page, 'compare-pdf-0').click()]);
  expect(pdf.suggestedFilename()).toMatch(/face-spin-spin-report\.pdf$/);
  const saved = await pdf.path();
  expect(readFileSync(saved!).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const [csv] = await Promise.all([page.waitForEvent('download'), byTestId(page, 'compare-csv').click()]);
  expect(readFileSync((await csv.path())!, 'utf8')).toContain('figure,unit,');

  // A short scatter study of the flip-prone variant.
  await page.goto(`${partPath}/scatter?variant=${v1.id}`);
  await byTestId(page, 'scatter-density-grip').waitFor();
  await byTestId(page, 'scatter-size-hoop').fill('0.2');
  await byTestId(page, 'scatter-samples').fill('300');
  await byTestId(page, 'scatter-seed').fill('11');
  await byTestId(page, 'scatter-start').click();
  await byTestId(page, 'scatter-result').waitFor({ timeout: 60000 });
  await byTestId(page, 'scatter-histogram-marginMajor').locator('svg').first().waitFor();
  expect(await byTestId(page, 'scatter-state').getAttribute('data-state')).toBe('done');
  expect(await byTestId(page, 'scatter-ranking-row').count()).toBeGreaterThan(0);
  await expectAccessible(page, '13-scatter-study-done');

  // Ask the demo reviewer for a review from the part editor's review panel.
  const mailsBefore = (await mailsTo(REVIEWER)).length;
  await page.goto(`${partPath}?variant=${v1.id}&panel=review`);
  const panel = await linkedSignOff(page, 1);
  await byTestId(page, 'review-reviewer').click();
  await page.locator(`[data-testid="review-reviewer-${REVIEWER}"]`).click();
  await byTestId(page, 'review-message').fill('The face spin flips, as expected; please confirm before we cut the normal-spin version.');
  await byTestId(page, 'review-request-submit').click();
  await panel.locator('[data-testid="status-chip"][data-status="in_review"]').waitFor();
  await expectAccessible(page, '14-review-requested');

  // The reviewer follows the e-mail's link in a second browser and approves.
  const mail = await waitForMail(REVIEWER, { count: mailsBefore + 1 });
  const link = new RegExp(`/review/${v1.id}`).exec(mail.text);
  expect(link).not.toBeNull();
  const other = reviewerBrowser.page;
  await signIn(other, REVIEWER);
  await other.goto(`${baseUrl()}/review/${v1.id}`);
  await other.waitForURL(new RegExp(`/projects/${project.id}/parts/${part.id}\\?variant=${v1.id}&panel=review`));
  // The link lands on that variant's report with its sign-off in view: nothing to click.
  const reviewPanel = await linkedSignOff(other, 1);
  await reviewPanel.locator('[data-testid="status-chip"][data-status="in_review"]').waitFor();
  await byTestId(other, 'review-approve').waitFor();
  expect(await byTestId(other, 'review-request-form').count()).toBe(0);
  await expectAccessible(other, '15-reviewer-before-decision');
  await byTestId(other, 'review-decision-body').fill('Confirmed from the polhode: the face spin turns over.');
  await byTestId(other, 'review-approve').click();
  await reviewPanel.locator('[data-testid="status-chip"][data-status="approved"]').waitFor();
  await expect(reviewPanel.locator('[data-testid="review-entry"][data-kind="approved"]').innerText()).resolves.toContain('Confirmed from the polhode');
  await expectAccessible(other, '16-reviewer-approved');

  const thread = await api<{ status: string }>(`/workspaces/${ws}/variants/${v1.id}/review`, token);
  expect(thread.status).toBe('approved');
}, 300000); // Two browsers, a simulation and a scatter job on a shared machine.
