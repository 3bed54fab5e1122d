// The animator's take player in Chromium against the real API: open a take, tune the gain live
// (the view changes), compare and heat map, save a new take, and the live-tuning figure for a
// 600-frame take with K = 32.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { API_URL, ARTIFACTS_DIR } from '../helpers/env.ts';
import { makeK32Take } from '../helpers/solver-take.ts';
import {
  pixelDifference,
  renderCount,
  signInAndOpen,
  viewportCanvas,
  waitForRender,
} from '../helpers/take-page.ts';
import { makeTakeWorld, TAKE_WORLD_FIRST_FRAME, type TakeWorld } from '../helpers/take-world.ts';

// A shot frame well inside the shot (the clip's 400th frame), where the demo clip moves and the
// tissue swings.
const FRAME = TAKE_WORLD_FIRST_FRAME + 400;

describe('take player: animator', () => {
  let world: TakeWorld;
  let browser: TestBrowser;

  beforeAll(async () => {
    world = await makeTakeWorld();
    browser = await openBrowser();
    mkdirSync(ARTIFACTS_DIR, { recursive: true });
  }, 300_000);

  afterAll(async () => {
    await browser?.close();
  });

  it('opens the take at the frame of the address and shows only what an animator may do', async () => {
    const { page } = browser;
    const { email, password } = world.people.animator;
    await signInAndOpen(
      page,
      email,
      password,
      `/shows/${world.showId}/takes/${world.takeId}?frame=${FRAME}`,
    );
    await page.getByTestId('take-player').waitFor({ timeout: 30_000 });
    await waitForRender(page, 0);
    await expect.poll(() => page.getByTestId('frame-counter').textContent()).toBe(String(FRAME));
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Take v1');
    await expect.poll(() => page.getByTestId('controls-panel').count()).toBe(1);
    await expect.poll(() => page.getByTestId('save-new-take').count()).toBe(1);
    // Approving is for supervisors; writing notes is for animators too.
    await expect.poll(() => page.getByTestId('decision-actions').count()).toBe(0);
    await expect.poll(() => page.getByTestId('note-form').count()).toBe(1);
    await expect.poll(() => page.getByTestId('review-state').textContent()).toBe('Awaiting review');
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'take-player.png'), fullPage: true });
  });

  it('gives the view the window’s width, with the controls and review beside it on a wide screen', async () => {
    const { page } = browser;
    const box = async (testId: string) => {
      const b = await page.getByTestId(testId).boundingBox();
      if (!b) throw new Error(`${testId} has no box`);
      return b;
    };
    // 1280 × 800: the view spans the page, less its margins; the panels come under it.
    const narrow = await box('take-viewport');
    expect(narrow.width).toBeGreaterThan(1280 - 80);
    expect((await box('controls-panel')).y).toBeGreaterThan(narrow.y + narrow.height);

    const renders = await renderCount(page);
    await page.setViewportSize({ width: 1920, height: 1080 });
    try {
      // The view draws again at its new size.
      await waitForRender(page, renders);
      await expect.poll(async () => (await box('take-viewport')).width).toBeGreaterThan(1300);
      const wide = await box('take-viewport');
      const controls = await box('controls-panel');
      const review = await box('review-panel');
      expect(controls.x).toBeGreaterThan(wide.x + wide.width);
      expect(review.x).toBe(controls.x);
      // The transport stays in sight under the view without scrolling.
      const transport = await box('transport');
      expect(transport.y + transport.height).toBeLessThan(1080);
      await page.screenshot({ path: join(ARTIFACTS_DIR, 'take-player-1920.png'), fullPage: true });
    } finally {
      await page.setViewportSize({ width: 1280, height: 800 });
    }
  });

  it('changes the view while the gain moves, and back again', async () => {
    const { page } = browser;
    const canvas = viewportCanvas(page);
    const before = await canvas.screenshot();
    let renders = await renderCount(page);
    const gain = page.getByLabel('Gain', { exact: true });
    await gain.focus();
    await gain.press('End'); // the slider's maximum: 4 ×
    renders = await waitForRender(page, renders);
    await expect.poll(() => page.getByTestId('tune-ms').textContent()).toMatch(/^\d+\.\d$/);
    const first = await page.getByTestId('tune-ms').textContent();
    console.log(`[animator] first live update after opening the take: ${first} ms`);
    const after = await canvas.screenshot();
    const diff = await pixelDifference(page, before, after);
    console.log(
      `[animator] gain 1 → 4 at frame ${FRAME}: ${diff.changed} of ${diff.total} pixels changed`,
    );
    expect(diff.changed).toBeGreaterThan(200);

    // The same controls give the same picture: gain back to 1 restores the take.
    await gain.press('Home');
    for (let i = 0; i < 20; i++) await gain.press('ArrowRight'); // 0 → 1 in steps of 0.05
    await waitForRender(page, renders);
    await expect.poll(() => page.getByTestId('save-new-take').isDisabled()).toBe(true);
    const again = await canvas.screenshot();
    const back = await pixelDifference(page, before, again);
    expect(back.changed).toBeLessThan(diff.changed / 20);
  });

  it('compares with skinning alone side by side, and shows the heat map with a legend in mm', async () => {
    const { page } = browser;
    const beforeCompare = await renderCount(page);
    await page.getByTestId('compare-select').click();
    await page.getByRole('option', { name: 'Skinning only' }).click();
    await page.getByText('Skinning only', { exact: true }).first().waitFor();
    await page.getByRole('radio', { name: 'Side by side' }).waitFor();
    await waitForRender(page, beforeCompare);
    await page
      .getByTestId('take-viewport')
      .screenshot({ path: join(ARTIFACTS_DIR, 'take-compare.png') });

    await page.getByTestId('compare-select').click();
    await page.getByRole('option', { name: 'Nothing' }).click();
    const beforeHeat = await renderCount(page);
    await page.getByTestId('heat-map-switch').click();
    const legend = page.getByTestId('heat-legend');
    await legend.waitFor();
    await expect.poll(() => legend.textContent()).toContain('Dynamic offset (mm)');
    const scale = Number(await page.getByTestId('heat-scale').textContent());
    console.log(`[animator] heat map scale: ${scale} mm`);
    expect(scale).toBeGreaterThan(0);
    await waitForRender(page, beforeHeat);
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'take-heatmap.png'), fullPage: true });
    // The shortcut list ("?") names the heat map's key; pressing it does what the list says.
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await page.keyboard.press('?');
    const list = page.getByTestId('shortcuts-dialog');
    await list.waitFor();
    // The picture once the dialog has finished opening.
    await page.waitForFunction(() =>
      document.getAnimations().every((a) => a.playState !== 'running'),
    );
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'shortcuts.png') });
    const row = list.getByTestId('shortcut-toggleHeatMap');
    await expect.poll(() => row.textContent()).toContain('Heat map on or off');
    const key = (await row.getByTestId('shortcut-key').textContent()) ?? '';
    expect(key).toMatch(/^[A-Z]$/);
    await page.keyboard.press('Escape');
    await list.waitFor({ state: 'detached' });
    await page.keyboard.press(key.toLowerCase());
    await legend.waitFor({ state: 'detached' });
    await expect
      .poll(() => page.getByTestId('heat-map-switch').getAttribute('aria-checked'))
      .toBe('false');
    // The key after "g" belongs to the "go" sequence and never reaches the player: after "g" and
    // the heat map's key, one more press turns the heat map on (it would be off again otherwise).
    await page.keyboard.press('g');
    await page.keyboard.press(key.toLowerCase());
    await page.keyboard.press(key.toLowerCase());
    await expect
      .poll(() => page.getByTestId('heat-map-switch').getAttribute('aria-checked'))
      .toBe('true');
    await page.keyboard.press(key.toLowerCase());
    await legend.waitFor({ state: 'detached' });
  });

  it('tunes a 600-frame take with K = 32 live and reports the time per update', async () => {
    // The API's learning keeps only the directions above the noise floor (7 on the demo
    // capture), so the budget's case is made here by the solver and served, in a second tab
    // only, as this take's file.
    const made = await makeK32Take();
    expect([made.k, made.frameCount]).toEqual([32, 600]);
    const page = await browser.context.newPage();
    await page.route(`**/api/shows/${world.showId}/takes/${world.takeId}/file`, (route) =>
      route.fulfill({
        status: 200,
        contentType: 'model/gltf-binary',
        body: Buffer.from(made.bytes),
      }),
    );
    await page.goto(`${API_URL}/shows/${world.showId}/takes/${world.takeId}?frame=${FRAME}`);
    await page.getByTestId('take-player').waitFor({ timeout: 30_000 });
    await expect
      .poll(() => page.getByTestId('tune-timing').textContent())
      .toContain('600 frames, basis of 32');
    // Live tuning warms up while the page is idle after loading (see LiveTuning.warmUp).
    await page.waitForTimeout(1500);
    const figures: number[] = [];
    for (const label of ['Stiffness', 'Damping']) {
      const slider = page.getByLabel(label, { exact: true });
      await slider.focus();
      for (let i = 0; i < 20; i++) {
        await slider.press(i < 10 ? 'ArrowRight' : 'ArrowLeft');
        figures.push(Number(await page.getByTestId('tune-ms').textContent()));
      }
    }
    const sorted = [...figures].sort((a, b) => a - b);
    const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
    console.log(
      `[animator] live tuning, 600 frames, K = 32, headless Chromium, ${figures.length} updates: ` +
        `median ${at(0.5)} ms, 95th percentile ${at(0.95)} ms, slowest ${at(1)} ms, ` +
        `${figures.filter((f) => f >= 16).length} at or over the 16 ms budget`,
    );
    expect(figures.every((f) => Number.isFinite(f) && f > 0)).toBe(true);
    await page.close();
  }, 240_000);

  it('saves the tuned controls as a new take and follows the job to it', async () => {
    const { page } = browser;
    const gain = page.getByLabel('Gain', { exact: true });
    await gain.focus();
    for (let i = 0; i < 10; i++) await gain.press('ArrowRight'); // 1 → 1.5
    await page.getByTestId('save-new-take').click();
    const job = page.getByTestId('save-job');
    await job.and(page.locator('[data-state="solved"]')).waitFor({ timeout: 120_000 });
    const link = page.getByTestId('new-take-link');
    await expect.poll(() => link.textContent()).toBe('Open take v2');

    const takes = await world.people.animator.session.call<
      { id: string; version: number; controls: { gain: number } }[]
    >('GET', `/shows/${world.showId}/shots/${world.shotId}/takes`);
    const v2 = takes.find((t) => t.version === 2);
    expect(v2?.controls.gain).toBeCloseTo(1.5, 9);

    await link.click();
    await page.waitForURL(new RegExp(`/takes/${v2?.id}`));
    await page.getByTestId('take-player').waitFor({ timeout: 30_000 });
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Take v2');
    await expect.poll(() => page.getByLabel('Gain', { exact: true }).inputValue()).toBe('1.5');

    // Take against take: v1 overlaid on v2 as a wireframe.
    const renders = await renderCount(page);
    await page.getByTestId('compare-select').click();
    await page.getByRole('option', { name: 'Take v1' }).click();
    await page.getByRole('radio', { name: 'Overlaid' }).click();
    await page.getByText(/Overlaid: Take v1 drawn as an amber wireframe/).waitFor();
    await waitForRender(page, renders);
    await page
      .getByTestId('take-viewport')
      .screenshot({ path: join(ARTIFACTS_DIR, 'take-compare-overlay.png') });
    expect(browser.consoleErrors).toEqual([]);
    expect(browser.failedRequests).toEqual([]);
  });
});
