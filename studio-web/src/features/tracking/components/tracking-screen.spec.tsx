import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SHOW, shotBody, shotPageBody, summaryBody, throughputBody } from '@/app/testing/fixtures';
import { calls, meBody, mockApi } from '@/app/testing/mock-api';
import { currentHref, renderApp } from '@/app/testing/render-app';
import { jsonResponse } from '@/testing/mock-fetch';

const SLOW = { timeout: 15_000 };
const LATE = shotBody('SQ010_0010', {
  dueDate: '2030-01-03',
  late: true,
  solveState: 'failed',
  reviewState: 'changes_requested',
  assignees: [{ id: 'u2', displayName: 'Tam Artist' }],
});
const ON_TIME = shotBody('SQ010_0020', { dueDate: '2999-01-01', renderState: 'rendering' });

function api() {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody('producer')),
    'GET /api/shows': () => jsonResponse([SHOW]),
    'GET /api/shows/show-1/members': () => jsonResponse([]),
    'GET /api/shows/show-1/shots/summary': () =>
      jsonResponse(
        summaryBody({
          total: 2,
          late: {
            count: 1,
            shots: [{ id: LATE.id, code: LATE.code, dueDate: '2030-01-03', daysLate: 4 }],
          },
        }),
      ),
    'GET /api/shows/show-1/shots/throughput': () => jsonResponse(throughputBody([1, 0, 2])),
    'GET /api/shows/show-1/shots': (url) =>
      jsonResponse(
        shotPageBody(url.searchParams.get('late') === 'true' ? [LATE] : [LATE, ON_TIME]),
      ),
  });
}

describe('TrackingScreen', { timeout: 30_000 }, () => {
  it('shows counts, both charts’ messages and each state as a word', async () => {
    api();
    renderApp('/shows/show-1/tracking');
    const table = await screen.findByTestId('shot-table', {}, SLOW);
    expect(screen.getByTestId('count-total').textContent).toBe('2');
    expect(
      screen.getByText(
        '3 takes approved over the last 3 weeks (2030-W01 to 2030-W03); 2 this week.',
      ),
    ).toBeTruthy();
    expect(
      screen.getByText(/1 shot is late\. The latest, SQ010_0010, is 4 days past/),
    ).toBeTruthy();
    const late = within(table).getAllByTestId('shot-row')[0];
    within(late).getByText('Failed');
    within(late).getByText('Changes requested');
    within(late).getByText('Tam Artist');
    within(late).getByText(/^Late by \d+ days?$/);
    const onTime = within(table).getAllByTestId('shot-row')[1];
    within(onTime).getByText('Rendering');
    within(onTime).getByText('Nobody');
  });

  it('asks the server for late shots when "Late only" is chosen, and keeps it in the address', async () => {
    const spy = api();
    const { router } = renderApp('/shows/show-1/tracking');
    await screen.findByTestId('shot-table', {}, SLOW);
    fireEvent.click(screen.getByRole('radio', { name: 'Late only' }));
    await waitFor(() => expect(screen.getAllByTestId('shot-row')).toHaveLength(1), SLOW);
    expect(currentHref(router)).toBe('/shows/show-1/tracking?late=true');
    expect(calls(spy)).toContain('GET /api/shows/show-1/shots?late=true&page=1&pageSize=25');
  });

  it('sorts by a column on the server, reversing on a second press', async () => {
    const spy = api();
    const { router } = renderApp('/shows/show-1/tracking');
    await screen.findByTestId('shot-table', {}, SLOW);
    fireEvent.click(screen.getByTestId('sort-dueDate'));
    await waitFor(() => expect(currentHref(router)).toContain('sort=dueDate%3Aasc'), SLOW);
    const sortOf = () =>
      screen.getByTestId('sort-dueDate').closest('th')?.getAttribute('aria-sort');
    await waitFor(() => expect(sortOf()).toBe('ascending'), SLOW);
    fireEvent.click(screen.getByTestId('sort-dueDate'));
    await waitFor(() => expect(currentHref(router)).toContain('sort=dueDate%3Adesc'), SLOW);
    await waitFor(
      () =>
        expect(calls(spy)).toContain(
          'GET /api/shows/show-1/shots?sort=dueDate%3Adesc%2Ccode%3Aasc&page=1&pageSize=25',
        ),
      SLOW,
    );
    await waitFor(() => expect(sortOf()).toBe('descending'), SLOW);
  });
});
