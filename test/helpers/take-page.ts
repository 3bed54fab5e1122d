// Browser-side helpers of the take player tests: sign in a browser, wait for the viewport to
// draw, and measure how much two screenshots differ.
import type { Locator, Page } from 'playwright-core';
import { API_URL } from './env.ts';

/** Signs in on the sign-in page as a person would, and lands on `path` (e.g. a take). */
export async function signInAndOpen(page: Page, email: string, password: string, path: string) {
  await page.goto(`${API_URL}/sign-in?redirectTo=${encodeURIComponent(path)}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => `${url.pathname}${url.search}` === path, { timeout: 20_000 });
}

/** The canvas of the take viewport. */
export const viewportCanvas = (page: Page): Locator =>
  page.getByTestId('take-viewport').locator('canvas');

/** How many frames the viewport has drawn so far. */
export async function renderCount(page: Page): Promise<number> {
  return Number((await viewportCanvas(page).getAttribute('data-renders')) ?? 0);
}

/** Waits until the viewport has drawn a frame after `since` renders. */
export async function waitForRender(page: Page, since: number, timeout = 10_000): Promise<number> {
  await page.waitForFunction(
    (n) =>
      Number(
        document
          .querySelector('[data-testid="take-viewport"] canvas')
          ?.getAttribute('data-renders') ?? 0,
      ) > n,
    since,
    { timeout },
  );
  return renderCount(page);
}

/** Pixels whose colour differs by more than `tolerance` (0–255, any channel) between two PNGs. */
export async function pixelDifference(
  page: Page,
  a: Buffer,
  b: Buffer,
  tolerance = 24,
): Promise<{ changed: number; total: number }> {
  // Decoded by the browser itself: no image library needed on the test side.
  return page.evaluate(
    async ([pa, pb, tol]) => {
      const pixels = async (base64: string) => {
        const img = new Image();
        img.src = `data:image/png;base64,${base64}`;
        await img.decode();
        const canvas = new OffscreenCanvas(img.width, img.height);
        const ctx = canvas.getContext('2d');
        if (!ctx) throw new Error('no 2D context');
        ctx.drawImage(img, 0, 0);
        return ctx.getImageData(0, 0, img.width, img.height);
      };
      const [x, y] = await Promise.all([pixels(pa as string), pixels(pb as string)]);
      if (x.width !== y.width || x.height !== y.height) throw new Error('sizes differ');
      let changed = 0;
      for (let i = 0; i < x.data.length; i += 4) {
        const d = Math.max(
          Math.abs(x.data[i] - y.data[i]),
          Math.abs(x.data[i + 1] - y.data[i + 1]),
          Math.abs(x.data[i + 2] - y.data[i + 2]),
        );
        if (d > (tol as number)) changed++;
      }
      return { changed, total: x.width * x.height };
    },
    [a.toString('base64'), b.toString('base64'), tolerance] as const,
  );
}
