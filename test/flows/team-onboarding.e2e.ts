import type { Page } from 'playwright-core';
import { accessibilityViolations, baseUrl, openBrowser, screenshot } from '../support/browser';
import { linkToken, waitForMail } from '../../server/src/test-support/mail-inbox';

/**
 * The first complete user flow: a team signs up, signs out and in again, invites a teammate from
 * the admin app, the teammate accepts from the real e-mail in a second browser, and the owner sees
 * the new member. Every screen is screenshotted and checked with axe.
 */
const stamp = Date.now().toString(36);
const owner = {
  workspace: `Gullwing Throwing Lab ${stamp}`,
  name: 'Aster Vale',
  email: `aster.${stamp}@example.test`,
  password: 'gullwing-pass-1',
};
const mate = { name: 'Bram Okafor-Lind', email: `bram.${stamp}@example.test`, password: 'teammate-pass-1' };

const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

async function expectAccessible(page: Page, screen: string): Promise<void> {
  await screenshot(page, screen);
  expect({ screen, violations: await accessibilityViolations(page) }).toEqual({ screen, violations: [] });
}

let first: Awaited<ReturnType<typeof openBrowser>>;
let second: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  first = await openBrowser();
  second = await openBrowser();
});
afterAll(async () => {
  await first?.close();
  await second?.close();
});

it('signs up, signs out, signs in, invites a teammate who accepts from the e-mail, and lists them', async () => {
  const page = first.page;

  await page.goto(`${baseUrl()}/signup`);
  await byTestId(page, 'signup-workspace').fill(owner.workspace);
  await byTestId(page, 'signup-name').fill(owner.name);
  await byTestId(page, 'signup-email').fill(owner.email);
  await byTestId(page, 'signup-password').fill('short');
  await byTestId(page, 'signup-submit').click();
  await byTestId(page, 'signup-password-error').waitFor();
  await expectAccessible(page, '01-sign-up-with-error');
  await byTestId(page, 'signup-password').fill(owner.password);
  await byTestId(page, 'signup-submit').click();
  await byTestId(page, 'projects-empty').waitFor();
  await expectAccessible(page, '02-projects-empty');

  await byTestId(page, 'user-menu').click();
  await byTestId(page, 'sign-out').click();
  await byTestId(page, 'signin-email').waitFor();
  await expectAccessible(page, '03-sign-in');

  await byTestId(page, 'signin-email').fill(owner.email);
  await byTestId(page, 'signin-password').fill(owner.password);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'projects-empty').waitFor();

  await page.goto(`${baseUrl()}/admin/invitations`);
  await byTestId(page, 'invite-email').fill(mate.email);
  await byTestId(page, 'invite-role').click();
  await byTestId(page, 'invite-role-designer').click();
  await byTestId(page, 'invite-submit').click();
  const row = byTestId(page, 'invitation-row').filter({ hasText: mate.email });
  await row.waitFor();
  await expect(row.locator('[data-testid="invitation-delivery"]').innerText()).resolves.toMatch(/sent/i);
  await expectAccessible(page, '04-admin-invitations');

  const mail = await waitForMail(mate.email);
  expect(mail.subject).toBe(`Join ${owner.workspace} on Tumblewise`);
  const token = linkToken(mail, '/invitations/accept');

  const other = second.page;
  await other.goto(`${baseUrl()}/invitations/accept?token=${token}`);
  await byTestId(other, 'accept-name').fill(mate.name);
  await expect(byTestId(other, 'invitation-workspace').innerText()).resolves.toContain(owner.workspace);
  await expectAccessible(other, '05-accept-invitation');
  await byTestId(other, 'accept-password').fill(mate.password);
  await byTestId(other, 'accept-submit').click();
  await byTestId(other, 'user-menu').waitFor();
  await screenshot(other, '06-teammate-signed-in');

  await page.goto(`${baseUrl()}/admin/members`);
  const memberRow = byTestId(page, 'member-row').filter({ hasText: mate.email });
  await memberRow.waitFor();
  await expect(memberRow.innerText()).resolves.toContain(mate.name);
  await expectAccessible(page, '07-admin-members');

  await page.goto(`${baseUrl()}/admin/audit`);
  await byTestId(page, 'audit-row').first().waitFor();
  await expect(byTestId(page, 'audit-table').innerText()).resolves.toMatch(/accepted/i);
  await expectAccessible(page, '08-admin-audit');
});
