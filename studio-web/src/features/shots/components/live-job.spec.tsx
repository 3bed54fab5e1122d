import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { SHOW, shotBody } from '@/app/testing/fixtures';
import { calls, meBody, mockApi } from '@/app/testing/mock-api';
import { renderApp } from '@/app/testing/render-app';
import { jsonResponse } from '@/testing/mock-fetch';

const BASE = `/api/shows/${SHOW.id}`;
const SLOW = { timeout: 10_000 };
const job = (state: string, stage: string | null, percent: number) => ({
  id: 'job-1',
  kind: 'retarget',
  state,
  stage,
  percent,
  attempts: 1,
  errorCode: null,
  errorMessage: null,
  shotId: 'shot-1',
  profileId: 'profile-1',
  takeId: state === 'solved' ? 'take-1' : null,
  controls: {},
  submittedBy: 'someone-else',
  createdAt: '2030-01-05T10:00:00.000Z',
  startedAt: null,
  finishedAt: null,
});

/** A stand-in for the browser's EventSource that the test drives by hand. */
class FakeEventSource {
  static last: FakeEventSource | null = null;
  onopen: (() => void) | null = null;
  onerror: (() => void) | null = null;
  private readonly listeners = new Map<string, (e: MessageEvent<string>) => void>();
  constructor(readonly url: string) {
    FakeEventSource.last = this;
  }
  addEventListener(type: string, listener: (e: MessageEvent<string>) => void) {
    this.listeners.set(type, listener);
  }
  removeEventListener(type: string) {
    this.listeners.delete(type);
  }
  close() {}
  emit(type: string, data: unknown) {
    this.listeners.get(type)?.(new MessageEvent(type, { data: JSON.stringify(data) }));
  }
}

function routes(role: string, jobAnswers: () => unknown) {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody(role)),
    'GET /api/shows': () => jsonResponse([SHOW]),
    [`GET ${BASE}/shots/shot-1`]: () => jsonResponse(shotBody('SQ010_0040', { id: 'shot-1' })),
    [`GET ${BASE}/shots/shot-1/takes`]: () => jsonResponse([]),
    [`GET ${BASE}/jobs`]: () => jsonResponse({ items: [job('queued', null, 0)] }),
    [`GET ${BASE}/jobs/job-1`]: () => jsonResponse(jobAnswers()),
    [`POST ${BASE}/jobs/job-1/cancel`]: () => jsonResponse(job('canceled', 'simulate', 40)),
  });
}

describe('a running retarget job on the shot page', { timeout: 30_000 }, () => {
  it('moves with the stream’s progress and state events, and a technical artist can cancel it', async () => {
    vi.stubGlobal('EventSource', FakeEventSource);
    const spy = routes('technical_artist', () => job('queued', null, 0));
    renderApp(`/shows/${SHOW.id}/shots/shot-1`);
    const card = await screen.findByTestId('live-job', {}, SLOW);
    const source = FakeEventSource.last as FakeEventSource;
    act(() => {
      source.onopen?.();
      source.emit('job.state', {
        jobId: 'job-1',
        kind: 'retarget',
        shotId: 'shot-1',
        state: 'solving',
      });
      source.emit('job.progress', {
        jobId: 'job-1',
        kind: 'retarget',
        shotId: 'shot-1',
        stage: 'simulate',
        percent: 40,
      });
    });
    await waitFor(() => within(card).getByText('Simulating the shot'));
    within(card).getByText('40 %');
    within(card).getByText('Solving');
    expect(screen.getByTestId('live-indicator').getAttribute('data-live')).toBe('true');

    fireEvent.click(within(card).getByRole('button', { name: 'Cancel job' }));
    await waitFor(() => expect(calls(spy)).toContain(`POST ${BASE}/jobs/job-1/cancel`));
  });

  it('asks for the job every moment while the stream is down, until it is solved', async () => {
    vi.stubGlobal('EventSource', undefined);
    let polls = 0;
    routes('animator', () =>
      ++polls < 2 ? job('solving', 'drive', 55) : job('solved', 'upload', 100),
    );
    renderApp(`/shows/${SHOW.id}/shots/shot-1`);
    const card = await screen.findByTestId('live-job', {}, SLOW);
    await waitFor(() => within(card).getByText('Driving from the clip'), SLOW);
    await waitFor(() => within(card).getByText('Solved'), SLOW);
    within(card).getByText('100 %');
    expect(screen.getByTestId('live-indicator').getAttribute('data-live')).toBe('false');
    // Animators may not cancel another person's job.
    expect(within(card).queryByRole('button', { name: 'Cancel job' })).toBeNull();
  });
});
