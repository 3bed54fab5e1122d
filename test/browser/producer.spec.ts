import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, type TestBrowser } from '../helpers/browser.ts';
import { ARTIFACTS_DIR } from '../helpers/env.ts';
import {
  ADMIN,
  createShow,
  createUser,
  signInApi,
  TEST_PASSWORD,
  type TestShow,
  type TestUser,
} from '../helpers/studio-api.ts';
import { realFailures, screenshot, signInUi } from '../helpers/studio-page.ts';

/** A date `days` from today (UTC), `YYYY-MM-DD`. */
function dayFromToday(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

/** Splits CSV text (RFC 4180: quoted fields, doubled quotes, CRLF) into rows of fields. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted && c === '"' && text[i + 1] === '"') {
      field += '"';
      i++;
    } else if (quoted && c === '"') {
      quoted = false;
    } else if (quoted) {
      field += c;
    } else if (c === '"') {
      quoted = true;
    } else if (c === ',') {
      row.push(field);
      field = '';
    } else if (c === '\n') {
      row.push(field.replace(/\r$/, ''));
      rows.push(row);
      row = [];
      field = '';
    } else {
      field += c;
    }
  }
  if (field !== '' || row.length) rows.push([...row, field]);
  return rows;
}

interface ShotRow {
  id: string;
  code: string;
  sequence: string;
  dueDate: string | null;
  late: boolean;
  renderState: string;
  assignees: { displayName: string }[];
}

/** The CSV the export button downloads, as rows keyed by the header's column names. */
async function downloadCsv(page: TestBrowser['page']): Promise<Record<string, string>[]> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId('export-csv').click(),
  ]);
  const [header, ...body] = parseCsv(readFileSync(await download.path(), 'utf8'));
  return body.map((r) => Object.fromEntries(header.map((name, i) => [name, r[i]])));
}

describe('tracking for a producer in Chromium', () => {
  let browser: TestBrowser;
  let show: TestShow;
  let producer: TestUser;
  // Late: due in the past, not approved. The rest: due later, or no due date.
  const late = [
    { code: 'SQ010_0010', due: dayFromToday(-9) },
    { code: 'SQ010_0020', due: dayFromToday(-3) },
    { code: 'SQ020_0010', due: dayFromToday(-1) },
  ];
  const onTime = [
    { code: 'SQ010_0030', due: dayFromToday(5) },
    { code: 'SQ020_0020', due: dayFromToday(30) },
    { code: 'SQ020_0030', due: undefined },
  ];

  beforeAll(async () => {
    const admin = await signInApi(ADMIN.email, ADMIN.password);
    show = await createShow(admin, 'Tracking check');
    producer = await createUser(admin, 'producer', [show.id], 'Paz Producer');
    const artist = await createUser(admin, 'technical_artist', [show.id], 'Tam Artist');
    for (const { code, due } of [...late, ...onTime]) {
      await artist.api.call('POST', `/shows/${show.id}/shots`, {
        sequence: code.slice(0, 5),
        code,
        frameStart: 1001,
        frameEnd: 1048,
        fps: 24,
        assigneeIds: [artist.id],
        ...(due ? { dueDate: due } : {}),
      });
    }
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('filters late shots and downloads a CSV whose rows match the API for the same filter', async () => {
    const { page } = browser;
    await signInUi(page, producer.email, TEST_PASSWORD);
    await page
      .getByTestId(`show-${show.code}`)
      .getByRole('link', { name: 'Tracking', exact: true })
      .click();
    await page.waitForURL(new RegExp(`/shows/${show.id}/tracking$`));
    await page.getByTestId('count-total').filter({ hasText: '6' }).waitFor();
    await expect(page.getByTestId('count-late').textContent()).resolves.toContain('3');
    await page.getByTestId('shot-table').waitFor();
    expect(await page.getByTestId('shot-row').count()).toBe(6);
    await page.getByTestId('throughput-chart').locator('svg').first().waitFor();
    await page.getByTestId('lateness-chart').locator('svg').first().waitFor();
    await screenshot(page, 'tracking');

    await page.getByTestId('filter-late').click();
    await page.waitForURL(/late=true/);
    await page.getByTestId('table-range').filter({ hasText: 'of 3' }).waitFor();
    const shown = await page
      .getByTestId('shot-row')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-code')));
    // Each late row says so in words, beside its due date.
    await expect(
      page
        .getByTestId('shot-table')
        .getByText(/^Late by \d+ days?$/)
        .count(),
    ).resolves.toBe(3);
    await screenshot(page, 'tracking-late');

    const api = await producer.api.call<{ items: ShotRow[]; total: number }>(
      'GET',
      `/shows/${show.id}/shots?late=true&pageSize=200`,
    );
    expect(api.total).toBe(3);
    expect(new Set(shown)).toEqual(new Set(api.items.map((s) => s.code)));
    expect(new Set(shown)).toEqual(new Set(late.map((s) => s.code)));

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByTestId('export-csv').click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/-shots-late-\d{4}-\d{2}-\d{2}\.csv$/);
    const path = await download.path();
    const rows = parseCsv(readFileSync(path, 'utf8'));
    const [header, ...body] = rows;
    const col = (name: string) => header.indexOf(name);
    expect(col('code')).toBeGreaterThanOrEqual(0);
    const csv = body.map((r) => ({
      code: r[col('code')],
      sequence: r[col('sequence')],
      due: r[col('due_date')],
      late: r[col('late')],
      assignees: r[col('assignees')],
    }));
    const expected = api.items.map((s) => ({
      code: s.code,
      sequence: s.sequence,
      due: s.dueDate ?? '',
      late: s.late ? 'yes' : 'no',
      assignees: s.assignees.map((a) => a.displayName).join('; '),
    }));
    const byCode = (a: { code: string }, b: { code: string }) => a.code.localeCompare(b.code);
    expect(csv.sort(byCode)).toEqual(expected.sort(byCode));

    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('sorts the table on the server by due date, latest due last', async () => {
    const { page } = browser;
    await page.getByRole('radio', { name: 'All shots' }).click();
    await page.getByTestId('table-range').filter({ hasText: 'of 6' }).waitFor();
    await page.getByTestId('sort-dueDate').click();
    await page.waitForURL(/sort=dueDate%3Aasc|sort=dueDate:asc/);
    const api = await producer.api.call<{ items: ShotRow[] }>(
      'GET',
      `/shows/${show.id}/shots?sort=dueDate:asc,code:asc&pageSize=200`,
    );
    await page.waitForFunction(
      (first) =>
        document.querySelector('[data-testid="shot-row"]')?.getAttribute('data-code') === first,
      api.items[0].code,
    );
    const shown = await page
      .getByTestId('shot-row')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-code')));
    expect(shown).toEqual(api.items.map((s) => s.code));
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });

  it('sets a past due date, assignees and the render state of a shot from its row, finds it among the late shots, and exports it as the API has it', async () => {
    const { page } = browser;
    const code = onTime[0].code;
    const past = dayFromToday(-2);
    const row = page.locator(`[data-testid="shot-row"][data-code="${code}"]`);
    await row.getByRole('button', { name: `Update… ${code}` }).click();
    const dialog = page.getByTestId('shot-plan-dialog');
    await dialog.getByLabel('Due date').fill(past);
    await dialog.getByText(/^In the past: the shot counts as late/).waitFor();
    await dialog.getByRole('checkbox', { name: 'Paz Producer' }).click();
    // The dialog is over the page: the window's picture, not the whole page's.
    await page.evaluate(() => document.fonts.ready);
    await page.waitForFunction(() =>
      document.getAnimations().every((a) => a.playState !== 'running'),
    );
    await page.screenshot({ path: join(ARTIFACTS_DIR, 'tracking-update.png') });
    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    await row.getByText('Late by 2 days', { exact: true }).waitFor();
    await page.getByTestId('count-late').filter({ hasText: '4' }).waitFor();

    await page.getByTestId('filter-late').click();
    await page.getByTestId('table-range').filter({ hasText: 'of 4' }).waitFor();
    const shown = await page
      .getByTestId('shot-row')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-code')));
    expect(shown).toContain(code);

    // Render state by hand: the dialog offers the moves from "Not started", i.e. Queued.
    await row.getByRole('button', { name: `Update… ${code}` }).click();
    await dialog.getByRole('radio', { name: 'Queued' }).click();
    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByTestId('count-render-queued').filter({ hasText: '1' }).waitFor();
    await row.getByText('Queued', { exact: true }).waitFor();
    await screenshot(page, 'tracking-updated');

    const api = await producer.api.call<{ items: ShotRow[] }>(
      'GET',
      `/shows/${show.id}/shots?late=true&pageSize=200`,
    );
    const shot = api.items.find((s) => s.code === code);
    expect(shot).toMatchObject({ dueDate: past, late: true, renderState: 'queued' });
    expect(shot?.assignees.map((a) => a.displayName)).toEqual(['Paz Producer', 'Tam Artist']);

    const csv = await downloadCsv(page);
    expect(csv.map((r) => r.code).sort()).toEqual(api.items.map((s) => s.code).sort());
    expect(csv.find((r) => r.code === code)).toMatchObject({
      sequence: shot?.sequence,
      due_date: shot?.dueDate,
      late: 'yes',
      render_state: shot?.renderState,
      assignees: shot?.assignees.map((a) => a.displayName).join('; '),
    });
    expect(browser.consoleErrors).toEqual([]);
    expect(realFailures(browser.failedRequests)).toEqual([]);
  });
});
