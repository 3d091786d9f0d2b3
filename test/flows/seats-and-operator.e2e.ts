import type { Page, Response } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';

/**
 * Seats and the platform operator: a new owner tries a declined card (nothing changes), buys 3
 * seats with the accepted test card, invites teammates up to the limit, meets the limit message,
 * adds a seat and the invitation goes through. Then the demo operator suspends that workspace
 * with a reason (the owner sees the notice and cannot save) and restores it. Every screen is
 * screenshotted and checked with axe.
 */
const stamp = Date.now().toString(36);
const owner = {
  workspace: `Skipjack Disc Works ${stamp}`,
  name: 'Odile Brenner',
  email: `odile.${stamp}@example.test`,
  password: 'skipjack-pass-1',
};
const mates = ['wren', 'tamsin', 'ilya'].map((name) => `${name}.${stamp}@example.test`);
const operator = { email: 'operator@tumblewise.test', password: 'kestrel-demo-2026' };
const expiry = `12/${String((new Date().getFullYear() + 3) % 100).padStart(2, '0')}`;

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

/** Waits for the answer of one API call whose path ends with `pathEnd` (or matches it). */
function answerOf(page: Page, method: string, pathEnd: string | RegExp): Promise<Response> {
  const matches = (path: string) => (typeof pathEnd === 'string' ? path.endsWith(pathEnd) : pathEnd.test(path));
  return page.waitForResponse((r) => r.request().method() === method && matches(new URL(r.url()).pathname));
}

async function fillCard(page: Page, scope: string, number: string): Promise<void> {
  const panel = byTestId(page, scope);
  await panel.locator('[data-testid="card-number"]').fill(number);
  await panel.locator('[data-testid="card-expiry"]').fill(expiry);
  await panel.locator('[data-testid="card-cvc"]').fill('123');
}

async function invite(page: Page, email: string): Promise<Response> {
  await byTestId(page, 'invite-email').fill(email);
  const answer = answerOf(page, 'POST', '/invitations');
  await byTestId(page, 'invite-submit').click();
  return answer;
}

let ownerBrowser: Awaited<ReturnType<typeof openBrowser>>;
let operatorBrowser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  ownerBrowser = await openBrowser();
  operatorBrowser = await openBrowser();
});
afterAll(async () => {
  await ownerBrowser?.close();
  await operatorBrowser?.close();
});

it('buys seats, meets the seat limit, adds a seat; an operator suspends and restores the workspace', async () => {
  const page = ownerBrowser.page;

  await page.goto(`${baseUrl()}/signup`);
  await byTestId(page, 'signup-workspace').fill(owner.workspace);
  await byTestId(page, 'signup-name').fill(owner.name);
  await byTestId(page, 'signup-email').fill(owner.email);
  await byTestId(page, 'signup-password').fill(owner.password);
  await byTestId(page, 'signup-submit').click();
  await byTestId(page, 'projects-empty').waitFor();

  // Before the first purchase the workspace runs on the evaluation allowance.
  await page.goto(`${baseUrl()}/admin/subscription`);
  await byTestId(page, 'evaluation-allowance').waitFor();
  expect(await byTestId(page, 'nav-operator').count()).toBe(0);
  await expectAccessible(page, 'seats-01-subscription-evaluation');

  // A card that fails the check digit never leaves the form.
  await byTestId(page, 'buy-seats').fill('3');
  await fillCard(page, 'buy-panel', '4242 4242 4242 4241');
  await byTestId(page, 'card-submit').click();
  await expect(byTestId(page, 'card-number-error').innerText()).resolves.toMatch(/not a valid card number/);

  // The declined test card: the server's message, and nothing changes.
  await fillCard(page, 'buy-panel', '4000 0000 0000 0002');
  const declined = answerOf(page, 'POST', '/billing/subscription');
  await byTestId(page, 'card-submit').click();
  expect((await declined).status()).toBe(402);
  const declineBanner = byTestId(page, 'buy-panel').locator('[data-testid="error-banner"]');
  await declineBanner.waitFor();
  await expect(declineBanner.innerText()).resolves.toMatch(/declined/i);
  await expect(byTestId(page, 'payment-method').innerText()).resolves.toContain('No card on file');
  await byTestId(page, 'evaluation-allowance').waitFor();
  await expectAccessible(page, 'seats-02-card-declined');

  // The accepted test card buys 3 seats.
  await fillCard(page, 'buy-panel', '4242 4242 4242 4242');
  const bought = answerOf(page, 'POST', '/billing/subscription');
  await byTestId(page, 'card-submit').click();
  expect((await bought).status()).toBe(200);
  await byTestId(page, 'subscription-notice').waitFor();
  await expect(byTestId(page, 'seats-summary').innerText()).resolves.toMatch(/1\s+of\s+3 seats in use/);
  await expect(byTestId(page, 'payment-method').innerText()).resolves.toContain('4242');
  await expect(byTestId(page, 'seats-proration-note').innerText()).resolves.toBe('The change is prorated on the next invoice.');
  expect(await byTestId(page, 'evaluation-allowance').count()).toBe(0);
  await expectAccessible(page, 'seats-03-subscription-bought');

  // The owner and two pending invitations fill the 3 seats; the next invitation is refused.
  await page.goto(`${baseUrl()}/admin/invitations`);
  for (const email of mates.slice(0, 2)) {
    expect((await invite(page, email)).status()).toBe(201);
    await byTestId(page, 'invitation-row').filter({ hasText: email }).waitFor();
  }
  const refused = await invite(page, mates[2]);
  expect(refused.status()).toBe(409);
  await byTestId(page, 'invite-seat-limit').waitFor();
  await expect(byTestId(page, 'error-banner').first().innerText()).resolves.toMatch(/seats/i);
  expect(await byTestId(page, 'invitation-row').filter({ hasText: mates[2] }).count()).toBe(0);
  await expectAccessible(page, 'seats-04-invitation-seat-limit');

  // The way out: one more seat, then the invitation goes through.
  await byTestId(page, 'invite-buy-seats').click();
  await byTestId(page, 'seats-input').waitFor();
  await byTestId(page, 'seats-input').fill('2');
  await byTestId(page, 'seats-submit').click();
  await expect(byTestId(page, 'seats-error').innerText()).resolves.toMatch(/at least 3/);
  await byTestId(page, 'seats-input').fill('4');
  const changed = answerOf(page, 'PATCH', '/billing/subscription');
  await byTestId(page, 'seats-submit').click();
  expect((await changed).status()).toBe(200);
  await expect(byTestId(page, 'subscription-notice').innerText()).resolves.toContain('prorated on the next invoice');
  await expect(byTestId(page, 'seats-summary').innerText()).resolves.toMatch(/3\s+of\s+4 seats in use/);
  await expectAccessible(page, 'seats-05-seat-added');

  await page.goto(`${baseUrl()}/admin/invitations`);
  expect((await invite(page, mates[2])).status()).toBe(201);
  await byTestId(page, 'invitation-row').filter({ hasText: mates[2] }).waitFor();
  await expectAccessible(page, 'seats-06-invitation-through');

  await page.goto(`${baseUrl()}/admin/invoices`);
  await page.locator('[data-testid="invoices-table"], [data-testid="invoices-empty"]').first().waitFor();
  await expectAccessible(page, 'seats-07-invoices');

  // Not an operator: the platform pages say so.
  await page.goto(`${baseUrl()}/admin/operator/workspaces`);
  await byTestId(page, 'no-access').waitFor();
  await expect(byTestId(page, 'no-access').innerText()).resolves.toMatch(/platform operators/);
  expect(await byTestId(page, 'nav-operator').count()).toBe(0);

  // The operator finds the workspace and suspends it; a reason is required.
  const op = operatorBrowser.page;
  await op.goto(`${baseUrl()}/signin?returnTo=${encodeURIComponent('/admin/operator/workspaces')}`);
  await byTestId(op, 'signin-email').fill(operator.email);
  await byTestId(op, 'signin-password').fill(operator.password);
  await byTestId(op, 'signin-submit').click();
  await byTestId(op, 'operator-table').waitFor();
  await byTestId(op, 'nav-operator').waitFor();
  const listed = answerOf(op, 'GET', '/operator/workspaces');
  await byTestId(op, 'operator-search').fill(stamp);
  expect(new URL((await listed).url()).searchParams.get('q')).toBe(stamp);
  const row = byTestId(op, 'operator-row').filter({ hasText: owner.workspace });
  await row.waitFor();
  await expect(byTestId(op, 'operator-row').count()).resolves.toBe(1);
  await expect(row.innerText()).resolves.toMatch(/bench-monthly|Bench/);
  await expectAccessible(op, 'seats-08-operator-workspaces');

  await row.locator('[data-testid="operator-suspend"]').click();
  await byTestId(op, 'suspension-confirm').click();
  await expect(byTestId(op, 'suspension-reason-error').innerText()).resolves.toMatch(/Reason/);
  await byTestId(op, 'suspension-reason').fill('Card dispute under review');
  await expectAccessible(op, 'seats-09-suspend-dialog');
  const suspended = answerOf(op, 'POST', '/suspend');
  await byTestId(op, 'suspension-confirm').click();
  expect((await suspended).status()).toBe(200);
  await row.locator('[data-testid="operator-row-state"][data-state="suspended"]').waitFor();
  await expect(row.locator('[data-testid="operator-row-state"]').innerText()).resolves.toBe('Suspended');
  await expectAccessible(op, 'seats-10-operator-suspended');

  // The owner sees the notice and cannot save; reading still works.
  await page.goto(`${baseUrl()}/admin/invitations`);
  const notice = byTestId(page, 'workspace-state-banner');
  await notice.waitFor();
  await expect(notice.getAttribute('data-state')).resolves.toBe('suspended');
  await expect(notice.innerText()).resolves.toContain('You can sign in and read, not edit');
  const blocked = await invite(page, `late.${stamp}@example.test`);
  expect(blocked.status()).toBe(403);
  await expect(byTestId(page, 'error-banner').first().innerText()).resolves.toMatch(/suspended/i);
  await expectAccessible(page, 'seats-11-owner-suspended');

  await op.goto(`${baseUrl()}/admin/operator/workspaces`);
  const again = byTestId(op, 'operator-row').filter({ hasText: owner.workspace });
  await again.locator('[data-testid="operator-restore"]').click();
  await byTestId(op, 'suspension-reason').fill('Dispute settled');
  const restored = answerOf(op, 'POST', '/restore');
  await byTestId(op, 'suspension-confirm').click();
  expect((await restored).status()).toBe(200);
  await again.locator('[data-testid="operator-row-state"][data-state="active"]').waitFor();

  await byTestId(op, 'operator-tab-health').click();
  await byTestId(op, 'health-status').waitFor();
  await expect(byTestId(op, 'health-status').getAttribute('data-status')).resolves.toBe('ok');
  await expectAccessible(op, 'seats-12-platform-health');

  // Restored: the owner's notice is gone and saving works again.
  await page.goto(`${baseUrl()}/admin/audit`);
  await byTestId(page, 'audit-row').first().waitFor();
  expect(await byTestId(page, 'workspace-state-banner').count()).toBe(0);
  const billingOnly = page.waitForResponse(
    (r) => new URL(r.url()).pathname.endsWith('/audit') && new URL(r.url()).searchParams.get('action') === 'billing.',
  );
  await byTestId(page, 'audit-billing-filter').click();
  await billingOnly;
  await byTestId(page, 'audit-row').filter({ hasText: 'Invitation sent' }).first().waitFor({ state: 'detached' });
  await byTestId(page, 'audit-row').filter({ hasText: 'Seats changed' }).first().waitFor();
  await byTestId(page, 'audit-row').filter({ hasText: 'Seats bought' }).first().waitFor();
  await expectAccessible(page, 'seats-13-audit-billing');
}, 300_000); // 13 screens, each checked with axe

it('keeps the owner’s settings and materials, and shows an admin the subscription read-only', async () => {
  const page = ownerBrowser.page;

  // Settings: a tolerance out of range is refused in the form; a valid change is saved and read back.
  await page.goto(`${baseUrl()}/admin/settings`);
  await byTestId(page, 'settings-form').waitFor();
  await expect(byTestId(page, 'settings-density').inputValue()).resolves.toBe('5');
  await byTestId(page, 'settings-size').fill('25');
  await byTestId(page, 'settings-save').click();
  await expect(byTestId(page, 'settings-size-error').innerText()).resolves.toBe('Size tolerance must be from 0 to 10 mm.');
  await byTestId(page, 'settings-size').fill('0.3');
  await byTestId(page, 'settings-density').fill('8');
  await byTestId(page, 'settings-length').click();
  await page.getByRole('option', { name: 'cm', exact: true }).click();
  const saved = answerOf(page, 'PATCH', '/settings');
  await byTestId(page, 'settings-save').click();
  const body = (await saved).request().postDataJSON();
  expect(body.defaultTolerances).toEqual({ density: 0.08, size: 0.0003 });
  expect(body.displayUnits.length).toBe('cm');
  await byTestId(page, 'settings-notice').waitFor();
  await expectAccessible(page, 'seats-14-settings');

  // Materials: library rows are read-only; a workspace material is added, changed and deleted.
  await page.goto(`${baseUrl()}/admin/materials`);
  await byTestId(page, 'materials-table').waitFor();
  const library = byTestId(page, 'material-row').and(page.locator('[data-scope="library"]'));
  expect(await library.count()).toBeGreaterThan(0);
  expect(await library.first().locator('[data-testid="material-edit"]').count()).toBe(0);
  await byTestId(page, 'material-add').click();
  await byTestId(page, 'material-name').fill('Skipjack blend foam');
  await byTestId(page, 'material-family').click();
  await page.getByRole('option', { name: 'foam', exact: true }).click();
  await byTestId(page, 'material-density').fill('140');
  await byTestId(page, 'material-tolerance').fill('80');
  await byTestId(page, 'material-source').fill('Our own pycnometer measurements');
  await byTestId(page, 'material-save').click();
  await expect(byTestId(page, 'material-tolerance-error').innerText()).resolves.toBe('Density tolerance must be from 0 to 50 %.');
  await byTestId(page, 'material-tolerance').fill('6');
  await expectAccessible(page, 'seats-15-material-dialog');
  const created = answerOf(page, 'POST', '/materials');
  await byTestId(page, 'material-save').click();
  expect((await created).status()).toBe(201);
  const ours = byTestId(page, 'material-row').filter({ hasText: 'Skipjack blend foam' });
  await ours.waitFor();
  await expect(ours.innerText()).resolves.toMatch(/140[\s\S]*±6 %[\s\S]*Workspace/);
  await expectAccessible(page, 'seats-16-materials');

  await byTestId(page, 'materials-scope-filter').click();
  await page.getByRole('option', { name: 'This workspace only' }).click();
  await library.first().waitFor({ state: 'detached' });
  await page.locator('mat-option').first().waitFor({ state: 'detached' });

  await ours.locator('[data-testid="material-edit"]').click();
  await byTestId(page, 'material-density').fill('155');
  const updated = answerOf(page, 'PATCH', /\/materials\/[0-9a-f-]+$/);
  await byTestId(page, 'material-save').click();
  expect((await updated).status()).toBe(200);
  await ours.filter({ hasText: '155' }).waitFor();
  await ours.locator('[data-testid="material-delete"]').click();
  const removed = answerOf(page, 'DELETE', /\/materials\/[0-9a-f-]+$/);
  await byTestId(page, 'confirm-accept').click();
  expect((await removed).status()).toBe(204);
  await ours.waitFor({ state: 'detached' });

  // An admin of the demo workspace reads the subscription but changes nothing.
  const admin = operatorBrowser.page;
  await byTestId(admin, 'user-menu').click();
  await byTestId(admin, 'sign-out').click();
  await byTestId(admin, 'signin-email').waitFor();
  await admin.goto(`${baseUrl()}/signin?returnTo=${encodeURIComponent('/admin/subscription')}`);
  await byTestId(admin, 'signin-email').fill('admin@kestrelbay.test');
  await byTestId(admin, 'signin-password').fill(operator.password);
  await byTestId(admin, 'signin-submit').click();
  await byTestId(admin, 'billing-read-only-note').waitFor();
  expect(await byTestId(admin, 'card-form').count()).toBe(0);
  expect(await byTestId(admin, 'seats-input').count()).toBe(0);
  expect(await byTestId(admin, 'nav-operator').count()).toBe(0);
  await expectAccessible(admin, 'seats-17-subscription-read-only');
}, 300_000);
