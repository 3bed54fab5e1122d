import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SHOW } from '@/app/testing/fixtures';
import { calls, meBody, mockApi } from '@/app/testing/mock-api';
import { renderApp } from '@/app/testing/render-app';
import { jsonResponse } from '@/testing/mock-fetch';

const BASE = `/api/shows/${SHOW.id}`;
const SLOW = { timeout: 10_000 };
const CHARACTER = {
  id: 'char-1',
  assetId: 'asset-1',
  state: 'ready',
  validationReport: null,
  name: 'Coach',
  version: 2,
  joints: ['Hips'],
  regions: ['belly'],
  createdAt: '2030-01-01T00:00:00.000Z',
};

function routes(role = 'technical_artist') {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody(role)),
    'GET /api/shows': () => jsonResponse([SHOW]),
    [`GET ${BASE}/characters`]: () => jsonResponse([CHARACTER]),
    [`GET ${BASE}/captures`]: () => jsonResponse([]),
    [`GET ${BASE}/clips`]: () => jsonResponse([]),
    [`GET ${BASE}/profiles`]: () => jsonResponse([]),
  });
}

function fieldError(label: string): string {
  const ids = (screen.getByLabelText(label).getAttribute('aria-describedby') ?? '').split(' ');
  return ids.map((id) => (id ? (document.getElementById(id)?.textContent ?? '') : '')).join(' ');
}

function drop(files: File[]) {
  const input = within(screen.getByTestId('drop-area')).getByLabelText(/files to upload/);
  fireEvent.change(input, { target: { files } });
}

describe('capture upload form', { timeout: 30_000 }, () => {
  it('shows the caution and asks for the whole consent record before anything is sent', async () => {
    const spy = routes();
    renderApp(`/shows/${SHOW.id}/library`);
    fireEvent.click(await screen.findByRole('radio', { name: 'Capture' }, SLOW));
    expect(screen.getByTestId('capture-caution').textContent).toContain(
      'Body captures are personal data. Follow local data-protection law, the performer’s agreement and the studio’s counsel.',
    );
    drop([new File(['glb'], 'drill.glb')]);

    await waitFor(() =>
      expect(screen.getByTestId('upload-refused').textContent).toContain('consent record'),
    );
    expect(fieldError('Registered to character')).toContain('Choose the character');
    expect(fieldError('Performer reference code')).toContain(
      'Enter the performer’s reference code',
    );
    expect(fieldError('Consent scope')).toContain('Say what the performer agreed to');
    expect(fieldError('Consent expires on')).toContain('Enter the last day the consent holds');
    expect(calls(spy).some((c) => c.startsWith('POST'))).toBe(false);
  });

  it('refuses a name for a reference code and a consent that has expired, in words', async () => {
    routes();
    renderApp(`/shows/${SHOW.id}/library`);
    fireEvent.click(await screen.findByRole('radio', { name: 'Capture' }, SLOW));
    fireEvent.change(screen.getByLabelText('Performer reference code'), {
      target: { value: 'Jane Doe' },
    });
    fireEvent.change(screen.getByLabelText('Consent expires on'), {
      target: { value: '2001-02-03' },
    });
    fireEvent.change(screen.getByLabelText('Consent scope'), {
      target: { value: 'Profile learning for this show' },
    });
    drop([new File(['glb'], 'drill.glb')]);

    await waitFor(() => expect(fieldError('Performer reference code')).toContain('no spaces'));
    expect(fieldError('Consent expires on')).toContain('expired on 2001-02-03');
    expect(screen.getByLabelText('Consent scope').getAttribute('aria-invalid')).toBeNull();
  });

  it('refuses a file whose type does not fit the kind, naming the file', async () => {
    const spy = routes();
    renderApp(`/shows/${SHOW.id}/library`);
    await screen.findByTestId('drop-area', {}, SLOW);
    drop([new File(['x'], 'notes.txt')]);

    await waitFor(() =>
      expect(screen.getByTestId('upload-refused').textContent).toContain(
        'notes.txt is not a .glb file, which a character must be.',
      ),
    );
    expect(calls(spy).some((c) => c.startsWith('POST'))).toBe(false);
  });

  it('offers no upload to a role that may not upload', async () => {
    routes('animator');
    renderApp(`/shows/${SHOW.id}/library`);
    await screen.findByRole('heading', { name: 'Library' }, SLOW);
    await screen.findByTestId('character-table', {}, SLOW);
    expect(screen.queryByTestId('upload-panel')).toBeNull();
    expect(screen.queryByRole('tab', { name: /Captures/ })).toBeNull();
  });
});
