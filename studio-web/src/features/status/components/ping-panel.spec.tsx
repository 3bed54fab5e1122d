import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { PingPanel } from './ping-panel';

const QUEUED = { id: 'job-7', state: 'waiting', progress: { stage: 'queued', percent: 0 } };
const ACTIVE = { id: 'job-7', state: 'active', progress: { stage: 'step 3 of 5', percent: 60 } };
const DONE = {
  id: 'job-7',
  state: 'completed',
  progress: { stage: 'done', percent: 100 },
  result: { worker: 'worker-a1', steps: 5, finishedAt: '2030-01-15T10:20:31.000Z' },
};

// Polls arrive every 500 ms, so give the panel a few of them before giving up.
const POLLS = { timeout: 4000 };

describe('PingPanel', () => {
  it('posts a five-step test job, follows its progress and names the worker that handled it', async () => {
    const answers = [ACTIVE, DONE];
    const spy = mockFetch((url, init) => {
      if (init.method === 'POST') return jsonResponse(QUEUED, 201);
      expect(url).toBe('/api/diagnostics/pings/job-7');
      return jsonResponse(answers.length > 1 ? answers.shift() : answers[0]);
    });
    renderWithProviders(<PingPanel />);
    const panel = screen.getByTestId('ping-panel');
    expect(panel.getAttribute('data-state')).toBe('idle');

    fireEvent.click(screen.getByRole('button', { name: 'Send test job' }));

    await waitFor(() => expect(panel.getAttribute('data-state')).toBe('active'));
    within(panel).getByText('Running');
    within(panel).getByText('step 3 of 5');
    within(panel).getByText('60 %');

    await waitFor(() => expect(panel.getAttribute('data-state')).toBe('completed'), POLLS);
    within(panel).getByText('Completed');
    expect(within(panel).getByTestId('ping-result').textContent).toContain('worker-a1');

    const [postUrl, postInit] = spy.mock.calls[0];
    expect(postUrl).toBe('/api/diagnostics/pings');
    expect(JSON.parse(String(postInit?.body))).toEqual({ steps: 5 });
  });

  it('shows why a test job failed', async () => {
    mockFetch((_url, init) =>
      init.method === 'POST'
        ? jsonResponse(QUEUED, 201)
        : jsonResponse({ ...ACTIVE, state: 'failed', failedReason: 'Worker lost its queue link.' }),
    );
    renderWithProviders(<PingPanel />);
    fireEvent.click(screen.getByRole('button', { name: 'Send test job' }));

    const panel = screen.getByTestId('ping-panel');
    await waitFor(() => expect(panel.getAttribute('data-state')).toBe('failed'), POLLS);
    within(panel).getByText('Failed');
    within(panel).getByText('Worker lost its queue link.');
  });

  it('says the API cannot be reached when the test job cannot be sent', async () => {
    mockFetch(() => Promise.reject(new TypeError('Failed to fetch')));
    renderWithProviders(<PingPanel />);
    fireEvent.click(screen.getByRole('button', { name: 'Send test job' }));

    const callout = await screen.findByTestId('api-unreachable');
    expect(callout.textContent).toContain('Is npm start running?');
    expect(screen.getByTestId('ping-panel').getAttribute('data-state')).toBe('idle');
  });
});
