import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';

/**
 * The designer's main job on screen: the demo designer signs in, creates a project and a part, adds
 * three primitives through the forms, sees the verdict change when a dimension changes, saves two
 * variants and reads the parameter diff between them. Every screen is screenshotted and checked with axe.
 *
 * The physics of the check: spin about the face-plane axis across the handle of a racket-like part
 * is spin about its intermediate principal axis (flip-prone; the "tennis racket" case, a fact of the
 * trade, common practice); widening the throat block across that axis makes it the minor axis (steady).
 */
const stamp = Date.now().toString(36);
const designer = { email: 'designer@kestrelbay.test', password: 'kestrel-demo-2026' };
const projectName = `Practice racket ${stamp}`;

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

/** Screenshot, then axe on the whole page, the embedded 3-D viewer included. */
async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

/** Types a value into a field of the selected primitive's form (or the settings form). */
async function setField(page: Page, name: string, value: string): Promise<void> {
  const field = byTestId(page, `field-${name}`);
  await field.fill(value);
  await field.blur();
}

/** Waits until a form field shows `value`. */
async function waitForFieldValue(page: Page, name: string, value: string): Promise<void> {
  await page.waitForFunction(
    ([selector, expected]) => document.querySelector<HTMLInputElement>(selector)?.value === expected,
    [`[data-testid="field-${name}"]`, value] as const,
  );
}

/** Waits until the live report shows `verdict` for the document as it now stands. */
async function waitForVerdict(page: Page, verdict: string): Promise<void> {
  await page.locator(`[data-testid="report-verdict"][data-verdict="${verdict}"]`).waitFor();
  await byTestId(page, 'report-loading').waitFor({ state: 'detached' });
}

// The part editor renders the 3-D view on SwiftShader (CPU) beside the forms: allow for a slow machine.
jest.setTimeout(300_000);

let browser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => { browser = await openBrowser(); });
afterAll(async () => { await browser?.close(); });

it('creates a project and a part, sketches it from three primitives, watches the verdict change and saves two variants', async () => {
  const page = browser.page;

  await page.goto(`${baseUrl()}/signin`);
  await byTestId(page, 'signin-email').fill(designer.email);
  await byTestId(page, 'signin-password').fill(designer.password);
  await byTestId(page, 'signin-submit').click();
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
