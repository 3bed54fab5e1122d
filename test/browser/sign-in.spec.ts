import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { readLink } from '../helpers/mail-sink.ts';
import {
  ADMIN,
  createShow,
  createUser,
  signInApi,
  STUDIO_URL,
  TEST_PASSWORD,
  type TestShow,
  type TestUser,
} from '../helpers/studio-api.ts';
import { navKeys, realFailures, screenshot, signInUi, signOutUi } from '../helpers/studio-page.ts';

// What each role's main navigation offers inside a show (product.md, Roles).
const NAV: Record<string, string[]> = {
  admin: ['library', 'shots', 'tracking', 'admin', 'status'],
  technical_artist: ['library', 'shots', 'status'],
  animator: ['library', 'shots', 'status'],
  supervisor: ['library', 'shots', 'status'],
  producer: ['library', 'shots', 'tracking', 'status'],
};

describe('sign-in, navigation per role, session expiry and password reset in Chromium', () => {
  let browser: TestBrowser;
  let show: TestShow;
  const people: Record<string, TestUser> = {};

  beforeAll(async () => {
    const admin = await signInApi(ADMIN.email, ADMIN.password);
    show = await createShow(admin, 'Sign-in check');
    for (const role of ['technical_artist', 'animator', 'supervisor', 'producer']) {
      people[role] = await createUser(admin, role, [show.id], `Tester ${role}`);
    }
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('signs each role in and shows only the navigation that role can use', async () => {
    const { page } = browser;
    await page.goto(`${STUDIO_URL}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await screenshot(page, 'sign-in');

    const logins = [
      { role: 'admin', email: ADMIN.email, password: ADMIN.password },
      ...Object.entries(people).map(([role, u]) => ({
        role,
        email: u.email,
        password: TEST_PASSWORD,
      })),
    ];
    for (const { role, email, password } of logins) {
      await signInUi(page, email, password);
      await page.waitForURL(/\/shows$/);
      await page.getByTestId(`show-${show.code}`).waitFor();
      if (role === 'producer') await screenshot(page, 'shows');
      await page.getByTestId(`show-${show.code}`).getByRole('link', { name: 'Shots' }).click();
      await page.waitForURL(new RegExp(`/shows/${show.id}/shots`));
      await page.getByRole('navigation', { name: 'Main' }).locator('[data-nav="shots"]').waitFor();
      expect({ role, nav: await navKeys(page) }).toEqual({ role, nav: NAV[role] });
      await signOutUi(page);
    }
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('sends a user whose session ended to sign-in, then back to the page they were on', async () => {
    const { page, context } = browser;
    const producer = people.producer;
    await signInUi(page, producer.email, TEST_PASSWORD);
    const tracking = `/shows/${show.id}/tracking?late=true`;
    await page.goto(`${STUDIO_URL}${tracking}`);
    await page.getByRole('heading', { level: 1, name: 'Tracking' }).waitFor();

    // End this browser's session from outside, as an expiry or an admin would.
    // The cookie is scoped to /api, so ask for the cookies of an API address.
    const cookies = await context.cookies(`${STUDIO_URL}/api/auth/me`);
    const cookie = cookies.find((c) => c.name === 'overshoot_session');
    expect(cookie).toBeDefined();
    const out = await fetch(`${STUDIO_URL}/api/auth/sign-out`, {
      method: 'POST',
      headers: { Cookie: `overshoot_session=${cookie?.value}` },
    });
    expect(out.status).toBe(204);

    // The next request the page makes meets a 401.
    await page.getByTestId('filter-late').click();
    await page.getByRole('radio', { name: 'All shots' }).click();
    await page.waitForURL(/\/sign-in\?redirectTo=/);
    expect(new URL(page.url()).searchParams.get('redirectTo')).toMatch(
      new RegExp(`^/shows/${show.id}/tracking`),
    );
    await signInUi(page, producer.email, TEST_PASSWORD);
    expect(new URL(page.url()).pathname).toBe(`/shows/${show.id}/tracking`);
    await page.getByRole('heading', { level: 1, name: 'Tracking' }).waitFor();
    await signOutUi(page);
    expect(browser.consoleErrors.filter((e) => !/401/.test(e))).toEqual([]);
  });

  it('resets a forgotten password through the e-mailed link', async () => {
    const { page } = browser;
    const animator = people.animator;
    await page.goto(`${STUDIO_URL}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('heading', { name: 'Reset your password' }).waitFor();
    await page.getByLabel('E-mail').fill(animator.email);
    await page.getByRole('button', { name: 'Send a reset link' }).click();
    await page.getByRole('status').filter({ hasText: 'Check your inbox' }).waitFor();
    await screenshot(page, 'reset-password-request');

    const link = new URL(await readLink(animator.email, /reset-password#token=/));
    await page.goto(`${STUDIO_URL}${link.pathname}${link.hash}`);
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password', { exact: true }).fill('short');
    await page.getByRole('button', { name: 'Set the new password' }).click();
    await page.getByText('Choose a password of at least 12 characters.').waitFor();
    await screenshot(page, 'reset-password-form');

    const fresh = 'a-new-studio-password-2';
    await page.getByLabel('New password', { exact: true }).fill(fresh);
    await page.getByLabel('Repeat the password').fill(fresh);
    await page.getByRole('button', { name: 'Set the new password' }).click();
    await page.getByText('Your password is set.').waitFor();
    await page.getByRole('link', { name: 'Sign in' }).last().click();
    await signInUi(page, animator.email, fresh);
    await page.waitForURL(/\/shows$/);
    await signOutUi(page);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });
});
