// Steps through the library and shot screens in Chromium: uploads through the drop area, choices
// in the studio's selects, and waits on the states the pages expose as data attributes.
import type { Locator, Page } from 'playwright-core';

/** How long a file's background check may take on a busy machine, in milliseconds. */
const INGEST_MS = 90_000;

/** Picks `kind` in the upload panel, drops the file on the drop area, and waits until it is checked. */
export async function uploadThroughLibrary(
  page: Page,
  kind: 'Character' | 'Capture' | 'Clip',
  path: string,
): Promise<Locator> {
  await page.getByRole('radio', { name: kind }).click();
  await page.getByTestId('drop-area').locator('input[type="file"]').setInputFiles(path);
  const fileName = path.split('/').pop() ?? path;
  const row = page.locator(`[data-testid="upload-row"][data-file="${fileName}"]`);
  await row.and(page.locator('[data-phase="uploaded"]')).waitFor({ timeout: 60_000 });
  const check = row.getByTestId('upload-check');
  await check.and(page.locator('[data-state="ready"]')).waitFor({ timeout: INGEST_MS });
  return row;
}

/** Opens the select labelled `label` and chooses the option whose name matches `option`. */
export async function choose(page: Page, label: string, option: RegExp | string): Promise<void> {
  await page.getByLabel(label, { exact: true }).click();
  await page.getByRole('option', { name: option }).click();
}

/** Waits for a 3D preview to finish loading and draw; fails with the page's own message if not. */
export async function waitForPreview(page: Page): Promise<void> {
  const preview = page.getByTestId('asset-preview');
  await preview
    .and(page.locator('[data-status="ready"], [data-status="error"]'))
    .waitFor({ timeout: 60_000 });
  const status = await preview.getAttribute('data-status');
  if (status !== 'ready') {
    throw new Error(`The preview did not load: ${await page.getByRole('alert').allTextContents()}`);
  }
  // A few frames so the picture shows the framed subject, not the first clear.
  // (A string: it runs in the page, whose globals the test's types do not know.)
  await page.evaluate('new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)))');
}
