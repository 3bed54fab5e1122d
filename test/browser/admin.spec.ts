import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { readLink } from '../helpers/mail-sink.ts';
import {
  ADMIN,
  signInApi,
  STUDIO_URL,
  TEST_PASSWORD,
  tokenApi,
  unique,
} from '../helpers/studio-api.ts';
import { realFailures, screenshot, signInUi, signOutUi } from '../helpers/studio-page.ts';

describe('admin in Chromium: shows, invitations, pipeline tokens', () => {
  let browser: TestBrowser;
  beforeAll(async () => {
    browser = await openBrowser();
    await browser.context.grantPermissions(['clipboard-read', 'clipboard-write'], {
      origin: STUDIO_URL,
    });
  });
  afterAll(async () => {
    await browser?.close();
  });

  const code = unique('ADM').slice(0, 16);
  const invitee = `${unique('animator')}@studio.localhost`.toLowerCase();
  let showPath = '';

  it('creates a show and invites an animator to it; the e-mail arrives', async () => {
    const { page } = browser;
    await signInUi(page, ADMIN.email, ADMIN.password);
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Admin' })
      .click();
    await page.getByRole('heading', { name: 'Users' }).waitFor();
    await page.getByTestId('users-table').waitFor();
    await screenshot(page, 'admin-users');

    await page
      .getByRole('navigation', { name: 'Admin' })
      .getByRole('link', { name: 'Shows' })
      .click();
    // Checked before anything is sent: an empty form names both fields.
    await page.getByRole('button', { name: 'Create the show' }).click();
    await page.getByText('Enter a code, e.g. HARBOR.').waitFor();
    await page.getByText('Enter a name.').waitFor();
    await page.getByTestId('admin-shows-table').waitFor();
    await screenshot(page, 'admin-shows');
    await page.getByLabel('Code').fill(code);
    await page.getByLabel('Name', { exact: true }).fill('Admin check');
    await page.getByRole('button', { name: 'Create the show' }).click();
    await page.waitForURL(/\/admin\/shows\/[0-9a-f-]{36}$/);
    showPath = new URL(page.url()).pathname;
    await page.getByRole('heading', { name: new RegExp(code) }).waitFor();

    await page.getByRole('link', { name: 'Invitations' }).click();
    await page.getByLabel('E-mail').fill(invitee);
    await page.getByLabel('Role').click();
    await page.getByRole('option', { name: 'Animator' }).click();
    await page.getByRole('checkbox', { name: new RegExp(code) }).click();
    await page.getByRole('button', { name: 'Send the invitation' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Invitation sent to ${invitee}` })
      .waitFor();
    await page.getByTestId('invitations-table').getByText(invitee).waitFor();
    await screenshot(page, 'admin-invitations');

    // The mail goes out through the worker; the outbox shows what the sink received.
    await readLink(invitee, /accept-invitation#token=/);
    await page.getByRole('link', { name: 'Outbox' }).click();
    await page
      .getByTestId('outbox')
      .getByText(`to ${invitee}`)
      .first()
      .waitFor({ timeout: 15_000 });
    await screenshot(page, 'admin-outbox');
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('creates a pipeline token whose secret is shown once, copies it, and revokes it', async () => {
    const { page } = browser;
    await page.goto(`${STUDIO_URL}${showPath}`);
    await page.getByRole('button', { name: 'Create the token' }).click();
    await page.getByText('Choose at least one scope.').waitFor();
    await page.getByLabel('Token name').fill('render farm');
    await page.getByRole('checkbox', { name: 'Report render state' }).click();
    await page.getByRole('button', { name: 'Create the token' }).click();

    const secretBox = page.getByTestId('token-secret-value');
    await secretBox.waitFor();
    const secret = (await secretBox.textContent()) ?? '';
    expect(secret.length).toBeGreaterThan(20);
    await page.getByRole('button', { name: 'Copy the secret' }).click();
    await page.getByRole('button', { name: 'Copied' }).waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(secret);
    await page.getByTestId('tokens-table').getByText('render farm').waitFor();
    await screenshot(page, 'admin-show-token');

    // The secret works for the show, and the page never shows it again.
    const me = await tokenApi(secret).call<{ kind: string }>('GET', '/auth/me');
    expect(me.kind).toBe('token');
    await page.getByRole('button', { name: 'I have stored it' }).click();
    await expect(page.content()).resolves.not.toContain(secret);
    await page.reload();
    await page.getByTestId('tokens-table').getByText('render farm').waitFor();
    await expect(page.content()).resolves.not.toContain(secret);

    await page.getByRole('button', { name: 'Revoke render farm' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Revoke the token' }).click();
    await page.getByTestId('token-row').getByText('Revoked').waitFor();
    const after = await tokenApi(secret).raw('GET', '/auth/me');
    expect(after.status).toBe(401);
    await screenshot(page, 'admin-show');
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('lets the invited person accept, land in their show, and sign in again', async () => {
    const { page } = browser;
    await signOutUi(page);
    const link = new URL(await readLink(invitee, /accept-invitation#token=/));
    await page.goto(`${STUDIO_URL}${link.pathname}${link.hash}`);
    await page.getByRole('heading', { name: 'Join Overshoot' }).waitFor();
    await page.getByText(invitee).waitFor();
    await page.getByText(code).waitFor();
    await page.getByRole('button', { name: 'Create my account' }).click();
    await page.getByText('Enter your name.').waitFor();
    await screenshot(page, 'accept-invitation');

    await page.getByLabel('Your name').fill('Avery Quill');
    await page.getByLabel('New password', { exact: true }).fill(TEST_PASSWORD);
    await page.getByLabel('Repeat the password').fill(TEST_PASSWORD);
    await page.getByRole('button', { name: 'Create my account' }).click();
    await page.waitForURL(/\/shows$/);
    await page.getByTestId(`show-${code}`).waitFor();
    await expect(page.getByTestId('user-role').textContent()).resolves.toBe('Animator');
    await signOutUi(page);
    await signInUi(page, invitee, TEST_PASSWORD);
    await page.waitForURL(/\/shows$/);
    await signOutUi(page);
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('disables the new account from the users table, which ends sign-in for it', async () => {
    const { page } = browser;
    await signInUi(page, ADMIN.email, ADMIN.password);
    await page.goto(`${STUDIO_URL}/admin/users`);
    await page.getByRole('button', { name: 'Disable Avery Quill' }).click();
    await page
      .getByRole('alertdialog')
      .getByRole('button', { name: 'Disable the account' })
      .click();
    const row = page.locator(`[data-testid="user-row"][data-email="${invitee}"]`);
    await row.getByText('Disabled').waitFor();
    await expect(signInApi(invitee, TEST_PASSWORD)).rejects.toThrow(/ACCOUNT_DISABLED/);
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });
});
