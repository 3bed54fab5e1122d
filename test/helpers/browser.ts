// Debian's Chromium driven by playwright-core, headless, software rendering (no GPU here).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** A browser with a fresh profile, and what went wrong on its pages. */
export interface TestBrowser {
  context: BrowserContext;
  page: Page;
  consoleErrors: string[];
  failedRequests: string[];
  close(): Promise<void>;
}

const ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  // Without these Chromium keeps trying hosts this closed network refuses.
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
];

/** Starts Chromium with an empty profile and a 1280×800 page. */
export async function openBrowser(): Promise<TestBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'overshoot-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ARGS,
    viewport: { width: 1280, height: 800 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const consoleErrors: string[] = [];
  const failedRequests: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') consoleErrors.push(m.text());
  });
  page.on('pageerror', (e) => consoleErrors.push(e.message));
  page.on('requestfailed', (r) =>
    failedRequests.push(`${r.method()} ${r.url()}: ${r.failure()?.errorText}`),
  );
  return {
    context,
    page,
    consoleErrors,
    failedRequests,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
