// The supervisor's review in Chromium against the real API: pin a note with a drawn mark to a
// frame, see the mark at that frame only, jump back to it from the note, and approve the take.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { ARTIFACTS_DIR } from '../helpers/env.ts';
import { realFailures } from '../helpers/studio-page.ts';
import { signInAndOpen, waitForRender } from '../helpers/take-page.ts';
import { makeTakeWorld, TAKE_WORLD_FIRST_FRAME, type TakeWorld } from '../helpers/take-world.ts';

// A shot frame (the clip's 420th frame; the shot starts at 1001).
const NOTE_FRAME = TAKE_WORLD_FIRST_FRAME + 420;

interface ApiNote {
  frame: number;
  text: string;
  mark: { strokes: { points: [number, number][] }[] } | null;
}

describe('take review: supervisor', () => {
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

  it('shows the review actions of a supervisor and not the live controls', async () => {
    const { page } = browser;
    const { email, password } = world.people.supervisor;
    const path = `/shows/${world.showId}/takes/${world.takeId}?frame=${NOTE_FRAME}`;
    await signInAndOpen(page, email, password, path);
    await page.getByTestId('take-player').waitFor({ timeout: 30_000 });
    await waitForRender(page, 0);
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME));
    await expect.poll(() => page.getByTestId('controls-panel').count()).toBe(0);
    await expect.poll(() => page.getByTestId('controls-summary').count()).toBe(1);
    await expect.poll(() => page.getByTestId('save-new-take').count()).toBe(0);
    await page.getByTestId('decision-actions').waitFor();
  });

  it('pins a note with a drawn mark to the frame on screen', async () => {
    const { page } = browser;
    await page.getByTestId('draw-mark').click();
    const layer = page.getByTestId('mark-layer');
    await layer.scrollIntoViewIfNeeded();
    const box = await layer.boundingBox();
    if (!box) throw new Error('the mark layer has no box');
    // A stroke from 30 % / 40 % of the view to 55 % / 35 %, in twelve moves.
    const from = { x: box.x + box.width * 0.3, y: box.y + box.height * 0.4 };
    const to = { x: box.x + box.width * 0.55, y: box.y + box.height * 0.35 };
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(to.x, to.y, { steps: 12 });
    await page.mouse.up();
    await expect
      .poll(() => page.getByTestId('draft-summary').textContent())
      .toMatch(/^1 stroke, \d+ points$/);
    await page.getByLabel(/New note at frame/).fill('Belly settles too late after the whistle.');
    await page.getByRole('button', { name: 'Pin note' }).click();
    const item = page.getByTestId('note-item');
    await item.waitFor();
    await expect.poll(() => item.getByRole('link').textContent()).toBe(String(NOTE_FRAME));
    await expect.poll(() => item.textContent()).toContain('Has a mark');
    await expect.poll(() => page.getByTestId('note-mark-stroke').count()).toBe(1);

    const notes = await world.people.supervisor.session.call<ApiNote[]>(
      'GET',
      `/shows/${world.showId}/takes/${world.takeId}/notes`,
    );
    expect(notes).toHaveLength(1);
    expect(notes[0].frame).toBe(NOTE_FRAME);
    const points = notes[0].mark?.strokes[0].points ?? [];
    expect(points.length).toBeGreaterThan(2);
    // Normalised to the view: the stroke starts and ends where the mouse did.
    expect(points[0][0]).toBeCloseTo(0.3, 2);
    expect(points[0][1]).toBeCloseTo(0.4, 2);
    expect(points[points.length - 1][0]).toBeCloseTo(0.55, 2);
    expect(points[points.length - 1][1]).toBeCloseTo(0.35, 2);
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'review.png'), fullPage: true });
  });

  it('shows the mark only at its frame and jumps back there from the note', async () => {
    const { page } = browser;
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await page.keyboard.press('.');
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME + 1));
    await expect.poll(() => page.getByTestId('note-mark-stroke').count()).toBe(0);
    await page.keyboard.press('Shift+.');
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME + 11));
    // "P" goes back to the previous note's frame, as the shortcut list says.
    await page.keyboard.press('p');
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME));
    await page.keyboard.press('.');
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME + 1));

    await page.getByRole('link', { name: `Go to frame ${NOTE_FRAME}` }).click();
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent())
      .toBe(String(NOTE_FRAME));
    await page.waitForURL(new RegExp(`[?&]frame=${NOTE_FRAME}$`));
    await expect.poll(() => page.getByTestId('note-mark-stroke').count()).toBe(1);

    // Space plays from here and pauses again; the mark leaves with its frame.
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await page.keyboard.press(' ');
    await expect
      .poll(() => page.getByTestId('frame-counter').textContent(), { timeout: 10_000 })
      .not.toBe(String(NOTE_FRAME));
    await page.keyboard.press(' ');
    await expect
      .poll(() => page.getByTestId('play-toggle').getAttribute('aria-pressed'))
      .toBe('false');
    await expect.poll(() => page.getByTestId('note-mark-stroke').count()).toBe(0);
  });

  it('approves the take after confirming, and the review state says so', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Approve…' }).click();
    const dialog = page.getByRole('alertdialog');
    await dialog.waitFor();
    await expect.poll(() => dialog.textContent()).toContain('Approve this take?');
    await dialog.getByLabel('Comment (optional)').fill('Reads well; ship it.');
    await dialog.getByRole('button', { name: 'Approve take' }).click();
    await dialog.waitFor({ state: 'detached' });
    const state = page.getByTestId('review-state');
    await state.and(page.locator('[data-state="approved"]')).waitFor();
    await expect.poll(() => state.textContent()).toBe('Approved');
    await expect.poll(() => page.getByTestId('decision-actions').count()).toBe(0);
    await expect
      .poll(() => page.getByTestId('decision-line').textContent())
      .toContain('Reads well; ship it.');

    const take = await world.people.supervisor.session.call<{ reviewState: string }>(
      'GET',
      `/shows/${world.showId}/takes/${world.takeId}`,
    );
    expect(take.reviewState).toBe('approved');

    // "G" then "H" leaves the player for the list of shows.
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await page.keyboard.press('g');
    await page.keyboard.press('h');
    await page.waitForURL((url) => url.pathname === '/shows');
    expect(browser.consoleErrors).toEqual([]);
    // Leaving the player closes its live event stream on purpose (net::ERR_ABORTED).
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });
});
