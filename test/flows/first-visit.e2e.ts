import { baseUrl, openBrowser } from '../support/browser';
import { byTestId, DEMO_PASSWORD, expectAccessible } from '../support/flow-helpers';

/**
 * A newcomer's first visit: exactly the address `npm start` prints first (the server's root, `/`),
 * sign-in, the project list, a reload of deep links in both apps, and a mistyped address that shows
 * the app's own not-found page rather than the server's "Cannot GET".
 */
let browser: Awaited<ReturnType<typeof openBrowser>>;
beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
});

it('opens the printed home address, signs in, reloads deep links and shows the not-found page', async () => {
  const page = browser.page;
  const home = await page.goto(`${baseUrl()}/`);
  expect(home?.status()).toBe(200);
  await byTestId(page, 'signin-email').waitFor();
  await expectAccessible(page, 'first-visit-01-home-signs-in');

  await byTestId(page, 'signin-email').fill('designer@kestrelbay.test');
  await byTestId(page, 'signin-password').fill(DEMO_PASSWORD);
  await byTestId(page, 'signin-submit').click();
  await byTestId(page, 'user-menu').waitFor();
  await byTestId(page, 'project-row').first().waitFor();
  expect(new URL(page.url()).pathname).toBe('/');

  // A reload of a deep link is answered with the app, which restores the session from its cookie.
  const projects = await page.goto(`${baseUrl()}/projects`);
  expect(projects?.status()).toBe(200);
  await byTestId(page, 'project-row').first().waitFor();
  const firstProject = await byTestId(page, 'project-row').first().locator('a').first().getAttribute('href');
  expect(firstProject).toMatch(/^\/projects\/[0-9a-f-]+$/);
  const deep = await page.goto(`${baseUrl()}${firstProject}`);
  expect(deep?.status()).toBe(200);
  await byTestId(page, 'user-menu').waitFor();
  expect(new URL(page.url()).pathname).toBe(firstProject);

  const mistyped = await page.goto(`${baseUrl()}/projcets/oops`);
  expect(mistyped?.status()).toBe(200);
  await byTestId(page, 'not-found').waitFor();
  await expect(page.locator('body').innerText()).resolves.not.toMatch(/Cannot GET/);
  await expectAccessible(page, 'first-visit-02-not-found');

  const admin = await page.goto(`${baseUrl()}/admin/members`);
  expect(admin?.status()).toBe(200);
  await byTestId(page, 'user-menu').waitFor();
  expect(new URL(page.url()).pathname).toBe('/admin/members');
});
