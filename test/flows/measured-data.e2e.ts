import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';

/**
 * Measured data on screen: the demo designer opens the junior racket's part editor, follows its
 * "Measured data" link, picks the variant whose prototype the demo seed measured and sees those
 * rig readings against the prediction; downloads the template; imports a CSV with bad rows (the
 * problems listed by line, nothing imported) and then a good one (the new rows with their
 * predicted moments and differences); undoes that import and removes one seeded reading, each
 * after a confirmation. Every state is screenshotted and checked with axe.
 */
const DEMO_PASSWORD = 'kestrel-demo-2026';
const DESIGNER = 'designer@kestrelbay.test';

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);
const rows = (page: Page) => byTestId(page, 'measurement-row');

async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

/** Waits until the confirmation dialog has finished opening (no transition left), so its screenshot is the settled dialog. */
async function dialogOpen(page: Page): Promise<void> {
  await byTestId(page, 'confirm-accept').waitFor();
  await page.locator('mat-dialog-container').evaluate((el) => Promise.all(el.getAnimations({ subtree: true }).map((a) => a.finished)));
  await page.waitForFunction(() => !document.querySelector('.mdc-dialog--opening'));
}

async function api<T>(path: string, token: string): Promise<T> {
  const res = await fetch(`${baseUrl()}/api/v1${path}`, { headers: { authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`GET ${path} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

type Report = { principal: { moments: number[] }; trade: { swingweight: number | null; twistweight: number | null } };

let browser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
});

it('shows the seeded rig readings against the prediction, refuses a bad CSV by line, imports a good one, undoes it and removes a reading', async () => {
  const { page } = browser;

  // The seeded variants of the racket frame, read through the API to know what to expect.
  const session = (await (
    await fetch(`${baseUrl()}/api/v1/auth/signin`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: DESIGNER, password: DEMO_PASSWORD }),
    })
  ).json()) as { accessToken: string; memberships: { workspace: { id: string; name: string } }[] };
  const ws = session.memberships.find((m) => m.workspace.name === 'Kestrel Bay Sports Lab')!.workspace.id;
  const projects = await api<{ id: string; name: string }[]>(`/workspaces/${ws}/projects`, session.accessToken);
  const racketProject = projects.find((p) => p.name === 'Junior racket')!;
  const parts = await api<{ id: string; name: string }[]>(`/workspaces/${ws}/projects/${racketProject.id}/parts`, session.accessToken);
  const frame = parts.find((p) => p.name === 'Frame')!;
  const variants = await api<{ id: string; number: number; report: Report }[]>(
    `/workspaces/${ws}/parts/${frame.id}/variants`,
    session.accessToken,
  );
  const measured = variants.find((v) => v.number === 2)!;
  const seeded = await api<unknown[]>(`/workspaces/${ws}/variants/${measured.id}/measurements`, session.accessToken);
  expect(seeded.length).toBeGreaterThanOrEqual(1);

  // Sign in and open the frame's part editor from the projects list.
  await page.goto(`${baseUrl()}/signin`);
  await byTestId(page, 'signin-email').fill(DESIGNER);
  await byTestId(page, 'signin-password').fill(DEMO_PASSWORD);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'user-menu').waitFor();
  await byTestId(page, 'project-link')
    .filter({ hasText: /^Junior racket$/ })
    .click();
  await page.locator(`[data-testid="part-row"][data-part-id="${frame.id}"] [data-testid="part-link"]`).click();
  await byTestId(page, 'editor-measurements').click();
  await page.waitForURL(/\/measurements\?variant=/);
  await byTestId(page, 'measurements-variant').waitFor();
  await expectAccessible(page, 'measured-data-1-landing');

  // The variant the seed measured: its readings, with the differences the seed built in (+3.1 %, −2.2 %).
  await byTestId(page, 'measurements-variant').selectOption(measured.id);
  await page.waitForURL(new RegExp(`variant=${measured.id}`));
  await byTestId(page, 'measurements-table').waitFor();
  await expect(rows(page).count()).resolves.toBe(seeded.length);
  const major = page.locator('[data-testid="measurement-row"][data-axis="major"]');
  await expect(major.locator('[data-testid="measurement-difference"]').innerText()).resolves.toContain('+3.1 %');
  await expect(major.locator('[data-testid="measurement-predicted"]').innerText()).resolves.toMatch(/\d/);
  const swing = page.locator('[data-testid="measurement-row"][data-axis="swing"]');
  await expect(swing.locator('[data-testid="measurement-difference"]').innerText()).resolves.toContain('−2.2 %');
  await expect(byTestId(page, 'measurements-estimates').innerText()).resolves.toContain('Measured and predicted values are both estimates');
  await expectAccessible(page, 'measured-data-2-seeded');

  // A CSV with two bad rows: every problem by line, nothing imported.
  const bad =
    'axis,value,unit,method\nmajor,250000,g·cm²,compound pendulum\nminor,-4,g·cm²,compound pendulum\nswing,1800,furlongs,swing rig\n';
  await byTestId(page, 'measurements-file').setInputFiles({ name: 'frame-rig-bad.csv', mimeType: 'text/csv', buffer: Buffer.from(bad) });
  await byTestId(page, 'measurements-problems').waitFor();
  const problems = await byTestId(page, 'measurements-problem').allInnerTexts();
  expect(problems).toEqual([
    'Line 3: value "-4" must be a positive number',
    expect.stringMatching(/^Line 4: unit "furlongs" must be one of/),
  ]);
  await expect(byTestId(page, 'measurements-problems').innerText()).resolves.toContain('Nothing was imported.');
  await expect(rows(page).count()).resolves.toBe(seeded.length);
  await expect(
    api<unknown[]>(`/workspaces/${ws}/variants/${measured.id}/measurements`, session.accessToken).then((r) => r.length),
  ).resolves.toBe(seeded.length);
  await expectAccessible(page, 'measured-data-3-refused');

  // A good CSV: one reading 8 % above the smallest principal moment (flagged), one 1 % under the
  // twistweight in an ASCII unit spelling, one about an axis with no prediction.
  const { moments } = measured.report.principal;
  const twist = measured.report.trade.twistweight ?? moments[1];
  const twistAxis = measured.report.trade.twistweight ? 'twist' : 'intermediate';
  const good = [
    'axis,value,unit,method',
    `minor,${moments[2] * 1.08 * 1e7},g·cm²,bifilar pendulum`, // 1 kg·m² = 10⁷ g·cm²
    `${twistAxis},${twist * 0.99 * 1e4},kg*cm^2,torsion pendulum`, // 1 kg·m² = 10⁴ kg·cm²
    'end-over-end (rig C),0.0031,kg·m²,trifilar pendulum',
  ].join('\n');
  // This time from the keyboard: focus the button, press Enter, answer the file dialog.
  await byTestId(page, 'measurements-choose').and(page.locator(':not([disabled])')).focus();
  await page.waitForFunction(() => document.activeElement?.getAttribute('data-testid') === 'measurements-choose');
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.keyboard.press('Enter')]);
  await chooser.setFiles({ name: 'frame-rig-c.csv', mimeType: 'text/csv', buffer: Buffer.from(good) });
  await byTestId(page, 'measurements-status').filter({ hasText: 'Imported 3 readings from frame-rig-c.csv' }).waitFor();
  await page.locator('[data-testid="measurement-row"][data-fresh="true"]').nth(2).waitFor();
  await expect(rows(page).count()).resolves.toBe(seeded.length + 3);
  await expect(byTestId(page, 'measurements-problems').count()).resolves.toBe(0);
  const minor = page.locator('[data-testid="measurement-row"][data-axis="minor"][data-fresh="true"]');
  await expect(minor.locator('[data-testid="measurement-difference"]').getAttribute('data-state')).resolves.toBe('far');
  await expect(minor.locator('[data-testid="measurement-difference"]').innerText()).resolves.toContain('+8.0 %');
  await expect(minor.locator('[data-testid="measurement-predicted"]').innerText()).resolves.toMatch(/\d/);
  const twistRow = page.locator(`[data-testid="measurement-row"][data-axis="${twistAxis}"][data-fresh="true"]`);
  await expect(twistRow.locator('[data-testid="measurement-difference"]').getAttribute('data-state')).resolves.toBe('near');
  await expect(twistRow.locator('[data-testid="measurement-difference"]').innerText()).resolves.toContain('−1.0 %');
  await expect(twistRow.locator('[data-testid="measurement-entered"]').innerText()).resolves.toContain('kg·cm²');
  const other = page.locator('[data-testid="measurement-row"][data-axis="end-over-end (rig C)"]');
  await expect(other.locator('[data-testid="measurement-difference"]').innerText()).resolves.toContain('no prediction for this axis');
  await expectAccessible(page, 'measured-data-4-imported');

  // That import was a mistake: undo it. The confirmation says how many readings go; then only the
  // seeded readings are left, on screen and on the server.
  await byTestId(page, 'measurements-undo-import').click();
  await dialogOpen(page);
  await expect(page.locator('mat-dialog-container').innerText()).resolves.toContain('The 3 readings it brought in are removed');
  await expectAccessible(page, 'measured-data-5-confirm-undo');
  await byTestId(page, 'confirm-accept').click();
  await byTestId(page, 'measurements-removed').filter({ hasText: 'Undid the import of frame-rig-c.csv: removed 3 readings.' }).waitFor();
  await page.locator('[data-testid="measurement-row"][data-fresh="true"]').first().waitFor({ state: 'detached' });
  await expect(rows(page).count()).resolves.toBe(seeded.length);
  await expect(byTestId(page, 'measurements-undo-import').count()).resolves.toBe(0);
  await expect(
    api<unknown[]>(`/workspaces/${ws}/variants/${measured.id}/measurements`, session.accessToken).then((r) => r.length),
  ).resolves.toBe(seeded.length);
  await expectAccessible(page, 'measured-data-6-import-undone');

  // Remove one seeded reading with its row's button (named after the reading), after confirming.
  const removeSwing = swing.locator('[data-testid="measurement-remove"]');
  await expect(removeSwing.getAttribute('aria-label')).resolves.toMatch(/^Remove the reading swing, /);
  await removeSwing.click();
  await dialogOpen(page);
  await expect(page.locator('mat-dialog-container').innerText()).resolves.toContain('Remove this reading?');
  await byTestId(page, 'confirm-accept').click();
  await byTestId(page, 'measurements-removed').filter({ hasText: 'Removed the reading “swing, ' }).waitFor();
  await swing.waitFor({ state: 'detached' });
  await expect(rows(page).count()).resolves.toBe(seeded.length - 1);
  await expect(major.count()).resolves.toBe(1);
  const left = await api<{ axis: string }[]>(`/workspaces/${ws}/variants/${measured.id}/measurements`, session.accessToken);
  expect(left.map((m) => m.axis)).not.toContain('swing');
  expect(left).toHaveLength(seeded.length - 1);
  await expectAccessible(page, 'measured-data-7-row-removed');

  // The template, made in the browser, starts with the header the server asks for.
  const [download] = await Promise.all([page.waitForEvent('download'), byTestId(page, 'measurements-template').click()]);
  expect(download.suggestedFilename()).toBe('Frame-v2-measurements.csv');
  expect(readFileSync((await download.path())!, 'utf8').split('\r\n')[0]).toBe('axis,value,unit,method');
});
