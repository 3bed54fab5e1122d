import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { HealthPanel } from './health-panel';

const DEGRADED = {
  status: 'degraded',
  checkedAt: '2030-01-15T10:20:30.000Z',
  services: {
    db: { status: 'up', latencyMs: 4.2 },
    redis: { status: 'up', latencyMs: 0.8 },
    s3: { status: 'down', latencyMs: 2001.5, error: 'connect ECONNREFUSED 127.0.0.1:4569' },
    smtp: { status: 'up', latencyMs: 12.34 },
  },
};

describe('HealthPanel', () => {
  it('shows each service’s state as a word, with latency and the error of a down service', async () => {
    mockFetch((url) => {
      expect(url).toBe('/api/health');
      return jsonResponse(DEGRADED, 503);
    });
    renderWithProviders(<HealthPanel />);

    const db = await screen.findByTestId('service-db');
    expect(db.getAttribute('data-state')).toBe('up');
    within(db).getByText('Database (MariaDB)');
    within(db).getByText('Up');
    within(db).getByText('4.2 ms');

    const s3 = screen.getByTestId('service-s3');
    expect(s3.getAttribute('data-state')).toBe('down');
    within(s3).getByText('File store (S3)');
    within(s3).getByText('Down');
    within(s3).getByText('connect ECONNREFUSED 127.0.0.1:4569');

    within(screen.getByTestId('service-redis')).getByText('Up');
    within(screen.getByTestId('service-smtp')).getByText('12.3 ms');
    screen.getByText('Degraded: 1 of 4 down');
    expect(screen.getByTestId('checked-at').querySelector('time')?.getAttribute('dateTime')).toBe(
      DEGRADED.checkedAt,
    );
  });

  it('keeps polling after a 503 and shows the next report', async () => {
    const allUp = {
      ...DEGRADED,
      status: 'up',
      services: { ...DEGRADED.services, s3: { status: 'up', latencyMs: 3 } },
    };
    let calls = 0;
    mockFetch(() => (++calls === 1 ? jsonResponse(DEGRADED, 503) : jsonResponse(allUp)));
    renderWithProviders(<HealthPanel />);

    const s3 = await screen.findByTestId('service-s3');
    expect(s3.getAttribute('data-state')).toBe('down');
    // The next poll is due 2 s later; allow for a slow machine.
    await waitFor(() => expect(s3.getAttribute('data-state')).toBe('up'), { timeout: 6000 });
    screen.getByText('All services up');
  });

  it('says the API cannot be reached, and what to do, when fetch rejects', async () => {
    mockFetch(() => Promise.reject(new TypeError('Failed to fetch')));
    renderWithProviders(<HealthPanel />);

    const callout = await screen.findByTestId('api-unreachable');
    expect(callout.textContent).toContain('Cannot reach the Overshoot API');
    expect(callout.textContent).toContain('Is npm start running?');
    expect(screen.queryByTestId('service-db')).toBeNull();
  });

  it('explains a health answer that lacks a service instead of crashing', async () => {
    const { smtp: _smtp, ...services } = DEGRADED.services;
    mockFetch(() => jsonResponse({ ...DEGRADED, services }, 503));
    renderWithProviders(<HealthPanel />);

    const callout = await screen.findByTestId('api-error');
    expect(callout.textContent).toContain('"smtp"');
    expect(callout.textContent).toContain('UNEXPECTED_RESPONSE');
  });
});
