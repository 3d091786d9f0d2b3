import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, screenshot } from '../support/browser';
import { byTestId, DEMO_PASSWORD, expectAccessible } from '../support/flow-helpers';

/**
 * The parameter map from a designer's seat: from the printed home address through sign-in to the
 * demo juggling baton's part editor, then its parameter map. A line of one field (the upper knob's
 * sideways offset) draws the steady margin with a second figure; a map of two fields (the upper knob's
 * sideways offset against the foam sleeve's bore) shows cells of more than one class with the
 * page's own legend, the bores wider than the sleeve as "no valid part"; a click on a cell shows
 * that point, which is loaded into the draft after a confirmation, and the part editor then shows
 * the new value. The page must not scroll sideways on a 390 px wide phone. Screenshots and axe at
 * every step.
 *
 * The physics of the check: the demo baton is symmetric about its long axis, so its two transverse
 * moments are equal; moving a knob sideways splits them, and spin about one of them becomes spin
 * about the intermediate axis (flip-prone; the intermediate-axis theorem, common practice). A bore
 * at least as wide as the sleeve's outer radius makes no sleeve at all (the part document's rule).
 */
const DESIGNER = 'designer@kestrelbay.test';

jest.setTimeout(300_000);

let browser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Picks a field for axis `k` from the select's option groups. */
async function chooseField(page: Page, k: number, primitive: string, parameter: string): Promise<void> {
  await byTestId(page, `map-parameter-${k}`).click();
  await byTestId(page, `map-option-${primitive}-${parameter}`).click();
  await byTestId(page, `map-option-${primitive}-${parameter}`).waitFor({ state: 'detached' });
}

/** Types into a field of the form, replacing what it held. */
async function fill(page: Page, testId: string, value: string): Promise<void> {
  await byTestId(page, testId).fill(value);
}

/** Waits until the confirmation dialog has finished opening, so its screenshot is the settled dialog. */
async function dialogOpen(page: Page): Promise<void> {
  await page.locator('mat-dialog-container').waitFor();
  await page.locator('mat-dialog-container').evaluate((el) => Promise.all(el.getAnimations({ subtree: true }).map((a) => a.finished)));
  await page.waitForFunction(() => !document.querySelector('.mdc-dialog--opening'));
}

/** Waits until the chart has redrawn at its box's size (it follows a resize on the next frames). */
async function chartFitted(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const box = document.querySelector<HTMLElement>('[data-testid="map-chart"]');
    const svg = box?.querySelector('svg');
    return !!box && !!svg && Math.abs(svg.getBoundingClientRect().width - box.clientWidth) < 1;
  });
}

/**
 * Clicks the centre of the map's cell (i across, j up) of an nx × ny grid. The plot area is the
 * chart's box less the grid margins of the map's options (left 64, right 16, top 16, bottom 56).
 */
async function clickCell(page: Page, i: number, j: number, nx: number, ny: number): Promise<void> {
  const box = (await byTestId(page, 'map-chart').boundingBox())!;
  const [left, right, top, bottom] = [64, 16, 16, 56];
  const w = box.width - left - right;
  const h = box.height - top - bottom;
  await page.mouse.click(box.x + left + ((i + 0.5) * w) / nx, box.y + top + ((ny - 1 - j + 0.5) * h) / ny);
}

it('maps two fields of the demo baton, loads a clicked point into the draft and sees it in the editor', async () => {
  const page = browser.page;

  // The printed home address asks for sign-in first.
  await page.goto(`${baseUrl()}/`);
  await byTestId(page, 'signin-email').fill(DESIGNER);
  await byTestId(page, 'signin-password').fill(DEMO_PASSWORD);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'user-menu').waitFor();

  await byTestId(page, 'project-link')
    .filter({ hasText: /^Juggling baton$/ })
    .click();
  await byTestId(page, 'part-link').filter({ hasText: 'Baton body' }).click();
  await byTestId(page, 'editor-parameter-map').click();
  await page.waitForURL(/\/parameter-map$/);
  await byTestId(page, 'map-form').waitFor();
  await expect(page.title()).resolves.toBe('Parameter map · Tumblewise');
  await expect(byTestId(page, 'crumb-part').innerText()).resolves.toBe('Baton body');
  await expect(byTestId(page, 'cautions').count()).resolves.toBe(1);
  await expectAccessible(page, 'parameter-map-01-settings');

  // One field: the upper knob's x offset, a line of the steady margin with the principal moment I1 beside it.
  await chooseField(page, 0, 'knob-high', 'position.0');
  await fill(page, 'map-from-0', '-30');
  await fill(page, 'map-to-0', '30');
  await byTestId(page, 'map-second').click();
  await byTestId(page, 'map-second-I1').click();
  await byTestId(page, 'map-second-I1').waitFor({ state: 'detached' });
  await expect(byTestId(page, 'map-total').innerText()).resolves.toContain('41 grid points');
  await byTestId(page, 'map-run').click();
  await byTestId(page, 'map-result').waitFor();
  await chartFitted(page);
  await expect(byTestId(page, 'map-chart').getAttribute('data-points')).resolves.toBe('41');
  await expect(byTestId(page, 'map-chart').getAttribute('aria-label')).resolves.toContain(
    'Steady margin against knob-high · Position x (mm)',
  );
  expect(Number(await byTestId(page, 'legend-flip-prone').getAttribute('data-count'))).toBeGreaterThan(0);
  await expectAccessible(page, 'parameter-map-02-line');

  // Two fields: the upper knob's x offset from −30 to 30 mm, and the sleeve's bore from 5 to 20 mm (its radius is 15 mm).
  await byTestId(page, 'map-two').click();
  await chooseField(page, 1, 'grip-foam', 'innerRadius');
  await fill(page, 'map-from-1', '5');
  await fill(page, 'map-to-1', '20');
  await expect(byTestId(page, 'map-total').innerText()).resolves.toContain('961 grid points');
  await byTestId(page, 'map-run').click();
  await page.locator('[data-testid="map-chart"][data-points="961"]').waitFor();
  await chartFitted(page);

  const count = async (cls: string) => Number(await byTestId(page, `legend-${cls}`).getAttribute('data-count'));
  const counts = {
    flip: await count('flip-prone'),
    watch: await count('watch'),
    steady: await count('steady'),
    none: await count('invalid'),
  };
  expect(counts.flip + counts.watch + counts.steady + counts.none).toBe(961);
  expect(counts.flip).toBeGreaterThan(0);
  // Bores of 15 mm and more (11 of the 31 steps of 0.5 mm) leave no sleeve, whatever the knob does.
  expect(counts.none).toBe(31 * 11);
  await expect(byTestId(page, 'map-legend').innerText()).resolves.toContain('No valid part');
  await expect(byTestId(page, 'map-summary').innerText()).resolves.toMatch(
    /^Of 961 grid points: Steady \d+ %, Watch [\d.]+ %, Flip-prone \d+ %/,
  );
  await expect(byTestId(page, 'map-chart').getAttribute('aria-label')).resolves.toContain('Map of the verdict');
  await expectAccessible(page, 'parameter-map-03-map');

  // No sideways scroll on a phone.
  await page.setViewportSize({ width: 390, height: 844 });
  await chartFitted(page);
  await byTestId(page, 'map-chart').scrollIntoViewIfNeeded();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await screenshot(page, 'parameter-map-04-narrow');
  await page.setViewportSize({ width: 1280, height: 860 });
  await chartFitted(page);

  // A click on the cell of x = 12 mm (step 21 of 31 from −30 mm) and bore 9 mm (step 8 of 31 from 5 mm).
  await byTestId(page, 'map-chart').scrollIntoViewIfNeeded();
  await clickCell(page, 21, 8, 31, 31);
  await byTestId(page, 'point-details').waitFor();
  await expect(byTestId(page, 'point-value-0').innerText()).resolves.toBe('12 mm');
  await expect(byTestId(page, 'point-value-1').innerText()).resolves.toBe('9 mm');
  await expect(byTestId(page, 'point-figures').innerText()).resolves.toContain('Steady margin');
  await expectAccessible(page, 'parameter-map-05-point');

  // Load it: asked first, then saved into the draft.
  await byTestId(page, 'point-load').click();
  await dialogOpen(page);
  await expect(page.locator('mat-dialog-container').innerText()).resolves.toContain('knob-high · Position x: 0 mm → 12 mm');
  await expect(page.locator('mat-dialog-container').innerText()).resolves.toContain('grip-foam · Inner radius stays 9 mm');
  await expectAccessible(page, 'parameter-map-06-confirm');
  await byTestId(page, 'confirm-accept').click();
  await byTestId(page, 'map-loaded').waitFor();
  await expectAccessible(page, 'parameter-map-07-loaded');

  // The part editor shows the loaded value.
  await byTestId(page, 'map-open-editor').click();
  await page.locator('[data-testid="primitive-row"][data-primitive-id="knob-high"] [data-testid="primitive-select"]').click();
  await page.waitForFunction(() => document.querySelector<HTMLInputElement>('[data-testid="field-position_0"]')?.value === '12');
  await expect(byTestId(page, 'field-position_0').inputValue()).resolves.toBe('12');
  await screenshot(page, 'parameter-map-08-editor');
});
