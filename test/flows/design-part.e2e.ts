import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { mailsTo, waitForMail } from '../../server/src/test-support/mail-inbox';
import { baseUrl, openBrowser } from '../support/browser';
import { api, byTestId, canvasPixels, DEMO_PASSWORD, drawnShare, expectAccessible, signIn } from '../support/flow-helpers';

/**
 * The designer's main job on screen, start to finish, through the forms: the demo designer signs in,
 * creates a project and a part, adds three primitives, sees the verdict change when a dimension
 * changes, saves two variants and reads their diff; plays the tumble preview of the flip-prone one
 * (the canvas must change between frames), compares the two, downloads a spin report as PDF, runs a
 * short scatter study starting from the tolerance set in the editor, and asks for a review; the demo
 * reviewer follows the e-mail's link in a second browser and approves. Every screen is screenshotted
 * and checked with axe, the embedded 3-D viewer included. The steps share one part, in order.
 *
 * The physics of the check: spin about the face-plane axis across the handle of a racket-like part
 * is spin about its intermediate principal axis (flip-prone; the "tennis racket" case, a fact of the
 * trade, common practice); widening the throat block across that axis makes it the minor axis (steady).
 */
const stamp = Date.now().toString(36);
const DESIGNER = 'designer@kestrelbay.test';
const REVIEWER = 'reviewer@kestrelbay.test';
const projectName = `Practice racket ${stamp}`;

/** Types a value into a field of the selected primitive's form (or the settings form). */
async function setField(page: Page, name: string, value: string): Promise<void> {
  const field = byTestId(page, `field-${name}`);
  await field.fill(value);
  await field.blur();
}

/** Waits until a form field shows `value`. */
async function waitForFieldValue(page: Page, name: string, value: string): Promise<void> {
  await page.waitForFunction(([selector, expected]) => document.querySelector<HTMLInputElement>(selector)?.value === expected, [
    `[data-testid="field-${name}"]`,
    value,
  ] as const);
}

/** Waits until the live report shows `verdict` for the document as it now stands. */
async function waitForVerdict(page: Page, verdict: string): Promise<void> {
  await page.locator(`[data-testid="report-verdict"][data-verdict="${verdict}"]`).waitFor();
  await byTestId(page, 'report-loading').waitFor({ state: 'detached' });
}

/** The sign-off panel of variant `number`, its report opened from the variant history. */
async function openSignOff(page: Page, number: number) {
  await page.locator(`[data-testid="variant-row"][data-variant-number="${number}"] [data-testid="variant-open"]`).click();
  await byTestId(page, 'sign-off-slot').scrollIntoViewIfNeeded();
  const panel = byTestId(page, 'sign-off-panel');
  await panel.locator('[data-testid="status-chip"]').waitFor();
  return panel;
}

// The part editor renders the 3-D view on SwiftShader (CPU) beside the forms: allow for a slow machine.
jest.setTimeout(300_000);

let designerBrowser: Awaited<ReturnType<typeof openBrowser>>;
let reviewerBrowser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  designerBrowser = await openBrowser();
  reviewerBrowser = await openBrowser();
});
afterAll(async () => {
  await designerBrowser?.close();
  await reviewerBrowser?.close();
});

/** What the first step made, for the steps after it. */
const made = { partUrl: '', workspaceId: '', partId: '', token: '', variants: [] as { id: string; number: number }[] };

it('creates a project and a part, sketches it from three primitives, watches the verdict change and saves two variants', async () => {
  const page = designerBrowser.page;

  await signIn(page, DESIGNER);
  await byTestId(page, 'project-table').waitFor();
  await expectAccessible(page, 'design-01-projects');

  await byTestId(page, 'new-project').click();
  await byTestId(page, 'project-name').fill(projectName);
  await byTestId(page, 'project-category').click();
  await byTestId(page, 'category-racket').click();
  await byTestId(page, 'project-create').click();
  await byTestId(page, 'project-row').filter({ hasText: projectName }).waitFor();
  await byTestId(page, 'projects-filter').fill(stamp);
  await expect(byTestId(page, 'project-row').count()).resolves.toBe(1);
  await expectAccessible(page, 'design-02-projects-filtered');

  await byTestId(page, 'project-link').filter({ hasText: projectName }).click();
  await byTestId(page, 'parts-empty').waitFor();
  await expectAccessible(page, 'design-03-project-empty');

  await byTestId(page, 'empty-new-part').click();
  await byTestId(page, 'part-name').fill('Frame');
  await byTestId(page, 'part-create').click();
  await byTestId(page, 'primitives-empty').waitFor();
  made.partUrl = page.url().replace(/[?#].*$/, '');
  await expectAccessible(page, 'design-04-editor-empty');

  // Handle: a cylinder along z, given by density.
  await byTestId(page, 'add-cylinder').click();
  await setField(page, 'radius', '13.5');
  await setField(page, 'length', '190');
  await setField(page, 'position_2', '95');
  await setField(page, 'density', '650');
  // Throat: a box.
  await byTestId(page, 'add-box').click();
  await setField(page, 'size_0', '20');
  await setField(page, 'size_1', '15');
  await setField(page, 'size_2', '120');
  await setField(page, 'position_2', '250');
  await setField(page, 'density', '1500');
  // Hoop: a torus turned into the xz-plane, its material picked from the list.
  await byTestId(page, 'add-torus').click();
  await setField(page, 'majorRadius', '110');
  await setField(page, 'minorRadius', '8');
  await setField(page, 'position_2', '420');
  await setField(page, 'rotation_0', '90');
  await byTestId(page, 'source-material').click();
  await byTestId(page, 'field-material').click();
  await page.locator('[data-testid="material-option"]', { hasText: 'Carbon/epoxy' }).click();
  // Its manufacturing tolerance: the hoop's section may be 0.2 mm off (the scatter study starts from it).
  await setField(page, 'tolerance-size', '0.2');
  await expect(byTestId(page, 'primitive-row').count()).resolves.toBe(3);

  // Spin about x: across the handle, in the face plane.
  await setField(page, 'spinAxis_0', '1');
  await setField(page, 'spinAxis_2', '0');
  await waitForVerdict(page, 'flip-prone');
  await expect(byTestId(page, 'report-turns').innerText()).resolves.toMatch(/about \d[\d.]* turns? before the first flip/);
  await expect(byTestId(page, 'report-explanation').innerText()).resolves.toMatch(/intermediate principal axis/);
  await expect(byTestId(page, 'report-checks').innerText()).resolves.toMatch(/indicative/i);
  await expectAccessible(page, 'design-05-editor-flip-prone');

  // A bad dimension is refused at its field and the report waits.
  await byTestId(page, 'primitive-select').nth(0).click();
  await setField(page, 'radius', '-2');
  await byTestId(page, 'report-stale').waitFor();
  await expect(page.locator('mat-error', { hasText: 'Radius must be greater than zero' }).count()).resolves.toBe(1);
  await expectAccessible(page, 'design-06-editor-invalid-field');
  await setField(page, 'radius', '13.5');
  await byTestId(page, 'report-stale').waitFor({ state: 'detached' });
  await waitForVerdict(page, 'flip-prone');

  await byTestId(page, 'save-variant').click();
  await byTestId(page, 'variant-label').fill('Narrow throat');
  await byTestId(page, 'variant-save-confirm').click();
  await byTestId(page, 'variant-row').first().waitFor();

  // Widen the throat across the spin axis: the axis becomes the minor one and the spin steady.
  await byTestId(page, 'primitive-select').nth(1).click();
  await setField(page, 'size_0', '400');
  await waitForVerdict(page, 'steady');
  await expectAccessible(page, 'design-07-editor-steady');

  // Undo and redo the widening from the keyboard.
  await page.keyboard.press('Control+z');
  await waitForFieldValue(page, 'size_0', '20');
  await waitForVerdict(page, 'flip-prone');
  await page.keyboard.press('Control+Shift+z');
  await waitForFieldValue(page, 'size_0', '400');
  await waitForVerdict(page, 'steady');

  await byTestId(page, 'save-variant').click();
  await byTestId(page, 'variant-label').fill('Wide throat');
  await byTestId(page, 'variant-save-confirm').click();
  await expect(page.locator('[data-testid="variant-row"][data-variant-number="2"]').waitFor()).resolves.toBeUndefined();
  await expect(byTestId(page, 'variant-row').count()).resolves.toBe(2);
  const diff = byTestId(page, 'variant-diff');
  await expect(diff.innerText()).resolves.toMatch(/Changed box "box-1"[\s\S]*size\[0\]: 20 mm → 400 mm/);
  await expectAccessible(page, 'design-08-variant-history');

  await page.locator('[data-testid="variant-row"][data-variant-number="1"] [data-testid="variant-open"]').click();
  // The panel is redrawn on the next change detection after the click: wait for it, then read it.
  await page.locator('[data-testid="spin-report"][aria-label*="(read-only)"]').waitFor();
  await expect(byTestId(page, 'spin-report').getAttribute('aria-label')).resolves.toMatch(/Variant 1 · Narrow throat \(read-only\)/);
  await page.locator('[data-testid="report-verdict"][data-verdict="flip-prone"]').waitFor();
  await expectAccessible(page, 'design-09-variant-open');

  await byTestId(page, 'crumb-project').click();
  const row = byTestId(page, 'part-row').filter({ hasText: 'Frame' });
  await row.waitFor();
  await expect(row.locator('[data-testid="verdict-chip"]').getAttribute('data-verdict')).resolves.toBe('steady');
  await expect(row.innerText()).resolves.toMatch(/v2/);
  await expectAccessible(page, 'design-10-project-parts');
});

it('plays the tumble preview of the flip-prone variant: the 3-D view and the polhode change between frames', async () => {
  const session = await api<{ accessToken: string; memberships: { workspace: { id: string; name: string } }[] }>('/auth/signin', null, {
    body: { email: DESIGNER, password: DEMO_PASSWORD },
  });
  made.token = session.accessToken;
  made.workspaceId = session.memberships.find((m) => m.workspace.name === 'Kestrel Bay Sports Lab')!.workspace.id;
  made.partId = /\/parts\/([^/]+)$/.exec(made.partUrl)![1];
  made.variants = await api<{ id: string; number: number }[]>(`/workspaces/${made.workspaceId}/parts/${made.partId}/variants`, made.token);
  const v1 = made.variants.find((v) => v.number === 1)!;

  const page = designerBrowser.page;
  await page.goto(`${made.partUrl}?variant=${v1.id}`);
  const canvas = byTestId(page, 'viewer-canvas');
  await canvas.scrollIntoViewIfNeeded();
  await byTestId(page, 'tumble-play').and(page.locator(':not([disabled])')).waitFor();
  await byTestId(page, 'omega-chart').locator('svg').first().waitFor();
  // Something is drawn over the background (the thin racket and its axes cover a few per cent of the view).
  expect(await drawnShare(page, 'viewer-canvas')).toBeGreaterThan(0.005);
  expect(await byTestId(page, 'tumble-summary').innerText()).toContain('Verdict: flip-prone');
  await expectAccessible(page, 'design-11-tumble-paused');
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
  await expectAccessible(page, 'design-12-tumble-playing');
  await byTestId(page, 'tumble-pause').click();
  await byTestId(page, 'view-top').click();
  await byTestId(page, 'tumble-play').waitFor();
});

it('compares the two variants from the editor and downloads a spin report as PDF and the table as CSV', async () => {
  const page = designerBrowser.page;
  await byTestId(page, 'editor-compare').click();
  await byTestId(page, 'compare-table').waitFor();
  await byTestId(page, 'compare-chart').locator('svg').first().waitFor();
  const verdicts = await byTestId(page, 'compare-row-verdict').locator('td').allInnerTexts();
  expect(verdicts.map((t) => t.trim()).sort()).toEqual(['flip-prone', 'steady']);
  await expectAccessible(page, 'design-13-compare');
  const [pdf] = await Promise.all([page.waitForEvent('download'), byTestId(page, 'compare-pdf-0').click()]);
  expect(pdf.suggestedFilename()).toMatch(/-spin-report\.pdf$/);
  expect(
    readFileSync((await pdf.path())!)
      .subarray(0, 5)
      .toString('latin1'),
  ).toBe('%PDF-');
  const [csv] = await Promise.all([page.waitForEvent('download'), byTestId(page, 'compare-csv').click()]);
  expect(readFileSync((await csv.path())!, 'utf8')).toContain('figure,unit,');
});

it('runs a short scatter study of the flip-prone variant, starting from the tolerance set in the editor', async () => {
  const page = designerBrowser.page;
  await page.goto(made.partUrl);
  await page.locator('[data-testid="variant-row"][data-variant-number="1"] [data-testid="variant-scatter"]').click();
  await byTestId(page, 'scatter-size-torus-1').waitFor();
  await expect(byTestId(page, 'scatter-size-torus-1').inputValue()).resolves.toBe('0.2');
  await byTestId(page, 'scatter-samples').fill('300');
  await byTestId(page, 'scatter-seed').fill('11');
  await byTestId(page, 'scatter-start').click();
  await byTestId(page, 'scatter-result').waitFor({ timeout: 60000 });
  await byTestId(page, 'scatter-histogram-marginMajor').locator('svg').first().waitFor();
  expect(await byTestId(page, 'scatter-state').getAttribute('data-state')).toBe('done');
  expect(await byTestId(page, 'scatter-ranking-row').count()).toBeGreaterThan(0);
  await expectAccessible(page, 'design-14-scatter-done');
});

it('asks the demo reviewer for a review; the reviewer follows the e-mail link and approves', async () => {
  const page = designerBrowser.page;
  const v1 = made.variants.find((v) => v.number === 1)!;
  const mailsBefore = (await mailsTo(REVIEWER)).length;
  await page.goto(made.partUrl);
  const panel = await openSignOff(page, 1);
  await byTestId(page, 'review-reviewer').click();
  await page.locator(`[data-testid="review-reviewer-${REVIEWER}"]`).click();
  await byTestId(page, 'review-message').fill('The face spin flips, as expected; please confirm before we cut the wide-throat version.');
  await byTestId(page, 'review-request-submit').click();
  await panel.locator('[data-testid="status-chip"][data-status="in_review"]').waitFor();
  await expectAccessible(page, 'design-15-review-requested');

  const mail = await waitForMail(REVIEWER, { count: mailsBefore + 1 });
  expect(new RegExp(`/review/${v1.id}`).test(mail.text)).toBe(true);
  const other = reviewerBrowser.page;
  await signIn(other, REVIEWER);
  await other.goto(`${baseUrl()}/review/${v1.id}`);
  await other.waitForURL(new RegExp(`/parts/${made.partId}\\?variant=${v1.id}&panel=review`));
  // The link lands on that variant's report with its sign-off in view: nothing to click.
  await other.locator('[data-testid="variant-row"][data-variant-number="1"] [data-testid="variant-open"][aria-pressed="true"]').waitFor();
  const reviewPanel = byTestId(other, 'sign-off-panel');
  await reviewPanel.locator('[data-testid="status-chip"][data-status="in_review"]').waitFor();
  await byTestId(other, 'review-approve').waitFor();
  expect(await byTestId(other, 'review-request-form').count()).toBe(0);
  expect(await byTestId(other, 'save-variant').count()).toBe(0);
  await expectAccessible(other, 'design-16-reviewer-before-decision');
  await byTestId(other, 'review-decision-body').fill('Confirmed from the polhode: the face spin turns over.');
  await byTestId(other, 'review-approve').click();
  await reviewPanel.locator('[data-testid="status-chip"][data-status="approved"]').waitFor();
  await expect(reviewPanel.locator('[data-testid="review-entry"][data-kind="approved"]').innerText()).resolves.toContain(
    'Confirmed from the polhode',
  );
  await expectAccessible(other, 'design-17-reviewer-approved');

  const thread = await api<{ status: string }>(`/workspaces/${made.workspaceId}/variants/${v1.id}/review`, made.token);
  expect(thread.status).toBe('approved');
});
