// Steps through the studio in Chromium that several browser tests share.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { ARTIFACTS_DIR } from './env.ts';
import { STUDIO_URL } from './studio-api.ts';

/** Opens the sign-in page, signs in, and waits to leave the page. */
export async function signInUi(page: Page, email: string, password: string): Promise<void> {
  if (!page.url().includes('/sign-in')) await page.goto(`${STUDIO_URL}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 15_000 });
}

/** Signs out through the user menu and waits for the sign-in page. */
export async function signOutUi(page: Page): Promise<void> {
  await page.getByTestId('user-menu').click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in/);
}

/** The keys (`data-nav`) of the main navigation's links, in order. */
export async function navKeys(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  return nav
    .locator('[data-nav]')
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-nav') ?? ''));
}

/** Saves a full-page screenshot under test/artifacts and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  const path = join(ARTIFACTS_DIR, `${name}.png`);
  // Let fonts and charts settle so the picture shows the page as people see it.
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/**
 * Failed requests other than cancellations: leaving a page or signing out cancels the
 * requests still in flight and closes live event streams on purpose (net::ERR_ABORTED).
 */
export function realFailures(failedRequests: string[]): string[] {
  return failedRequests.filter((r) => !r.endsWith('net::ERR_ABORTED'));
}
