import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { API_URL, ARTIFACTS_DIR } from '../helpers/env.ts';

describe('status page in Chromium', () => {
  let browser: TestBrowser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows database, queues, file store and mail up, and a job round trip through a worker', async () => {
    const { page } = browser;
    await page.goto(`${API_URL}/`);
    await page.waitForURL(/\/status$/);
    for (const service of ['db', 'redis', 's3', 'smtp']) {
      const row = page.getByTestId(`service-${service}`);
      await row.and(page.locator('[data-state="up"]')).waitFor({ timeout: 15_000 });
      // The state is shown as a word, not only as a colour.
      await expect(row.getByText('Up', { exact: true }).count()).resolves.toBe(1);
    }
    await expect(page.title()).resolves.toMatch(/Overshoot/);

    await page.getByRole('button', { name: /send test job/i }).click();
    const panel = page.getByTestId('ping-panel');
    await panel.and(page.locator('[data-state="completed"]')).waitFor({ timeout: 15_000 });
    await expect(panel.textContent()).resolves.toMatch(/100/);

    mkdirSync(ARTIFACTS_DIR, { recursive: true });
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'status-page.png'), fullPage: true });
    expect(browser.consoleErrors).toEqual([]);
    expect(browser.failedRequests).toEqual([]);
  });

  it('loads the bundled JetBrains Mono font from our own origin', async () => {
    const { page } = browser;
    const fontRequests: string[] = [];
    page.on('request', (r) => {
      if (r.resourceType() === 'font') fontRequests.push(r.url());
    });
    await page.goto(`${API_URL}/status`);
    await page.getByTestId('service-db').waitFor();
    await page.evaluate(() => document.fonts.ready);
    const loaded = await page.evaluate(() =>
      [...document.fonts].some(
        (f) => f.family.replace(/["']/g, '') === 'JetBrains Mono' && f.status === 'loaded',
      ),
    );
    expect(loaded).toBe(true);
    expect(fontRequests.length).toBeGreaterThan(0);
    for (const url of fontRequests) expect(url.startsWith(API_URL)).toBe(true);
  });
});
