import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SHOW, shotBody } from '@/app/testing/fixtures';
import { calls, meBody, mockApi } from '@/app/testing/mock-api';
import { renderApp } from '@/app/testing/render-app';
import { jsonResponse } from '@/testing/mock-fetch';
import type { Clip } from '@/features/library/api/library-types';
import { checkShotValues, EMPTY_SHOT } from './shot-form-values';

const BASE = `/api/shows/${SHOW.id}`;
// The whole app renders in these tests; give a busy machine time.
const SLOW = { timeout: 10_000 };

function routes(create: Parameters<typeof mockApi>[0][string]) {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody('technical_artist')),
    'GET /api/shows': () => jsonResponse([SHOW]),
    [`GET ${BASE}/characters`]: () => jsonResponse([]),
    [`GET ${BASE}/clips`]: () => jsonResponse([]),
    [`GET ${BASE}/members`]: () => jsonResponse([]),
    [`POST ${BASE}/shots`]: create,
  });
}

/** The error text tied to the field with this label (through aria-describedby). */
function fieldError(label: string): string {
  const input = screen.getByLabelText(label);
  const ids = (input.getAttribute('aria-describedby') ?? '').split(' ').filter(Boolean);
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}

function type(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

describe('shot form', { timeout: 30_000 }, () => {
  it('says under each field what to fix, and sends nothing, when required fields are empty', async () => {
    const spy = routes(() => jsonResponse(shotBody('X'), 201));
    renderApp(`/shows/${SHOW.id}/shots/new`);
    fireEvent.click(await screen.findByRole('button', { name: 'Create shot' }, SLOW));

    expect(fieldError('Sequence code')).toContain('Enter the sequence code');
    expect(fieldError('Shot code')).toContain('Enter the shot code');
    expect(fieldError('Last frame')).toContain('Enter the last frame');
    expect(screen.getByLabelText('Sequence code').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByLabelText('First frame').getAttribute('aria-invalid')).toBeNull();
    expect(calls(spy).some((c) => c.startsWith('POST'))).toBe(false);
  });

  it('checks codes and the frame order with the API’s rules before sending', async () => {
    routes(() => jsonResponse(shotBody('X'), 201));
    renderApp(`/shows/${SHOW.id}/shots/new`);
    await screen.findByRole('button', { name: 'Create shot' }, SLOW);
    type('Sequence code', 'SQ 010');
    type('Shot code', '_0040');
    type('First frame', '1001');
    type('Last frame', '990');
    fireEvent.click(screen.getByRole('button', { name: 'Create shot' }));

    expect(fieldError('Sequence code')).toContain('letters, digits, _ . or -');
    expect(fieldError('Shot code')).toContain('starting with a letter or digit');
    expect(fieldError('Last frame')).toContain('comes before the first (1001)');
  });

  it('shows the API’s per-field refusals (VALIDATION_FAILED details) under their fields', async () => {
    routes(() =>
      jsonResponse(
        {
          code: 'VALIDATION_FAILED',
          message: 'Some fields of the request are not valid.',
          details: [
            { field: 'fps', problems: ['fps must not be greater than 1000'] },
            { field: 'frameStart', problems: ['frameStart must be an integer number'] },
          ],
        },
        400,
      ),
    );
    renderApp(`/shows/${SHOW.id}/shots/new`);
    await screen.findByRole('button', { name: 'Create shot' }, SLOW);
    type('Sequence code', 'SQ010');
    type('Shot code', 'SQ010_0040');
    type('Last frame', '1096');
    fireEvent.click(screen.getByRole('button', { name: 'Create shot' }));

    await waitFor(
      () => expect(fieldError('Frame rate (fps)')).toContain('fps must not be greater than 1000'),
      SLOW,
    );
    expect(fieldError('First frame')).toContain('frameStart must be an integer number');
    expect(screen.getByLabelText('Shot code').getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByTestId('form-problems').textContent).toBe('2 fields need attention.');
  });

  it('puts a taken shot code under the code field', async () => {
    routes(() =>
      jsonResponse(
        { code: 'SHOT_CODE_TAKEN', message: 'The show already has a shot SQ010_0040.' },
        409,
      ),
    );
    renderApp(`/shows/${SHOW.id}/shots/new`);
    await screen.findByRole('button', { name: 'Create shot' }, SLOW);
    type('Sequence code', 'SQ010');
    type('Shot code', 'SQ010_0040');
    type('Last frame', '1096');
    fireEvent.click(screen.getByRole('button', { name: 'Create shot' }));

    await waitFor(
      () => expect(fieldError('Shot code')).toContain('already has a shot SQ010_0040'),
      SLOW,
    );
  });
});

describe('checkShotValues', () => {
  const clip = { name: 'walk', frameCount: 49, fps: 24 } as Clip;

  it('keeps the frame range inside the chosen clip, at the shot’s rate', () => {
    // 49 frames at 24 fps last 2 s; at 48 fps the shot's last frame can be at most 96.
    const values = { ...EMPTY_SHOT, sequence: 'SQ010', code: 'A', frameStart: '0', fps: '48' };
    expect(checkShotValues({ ...values, frameEnd: '96' }, clip).frameEnd).toBeUndefined();
    expect(checkShotValues({ ...values, frameEnd: '97' }, clip).frameEnd).toContain('at most 96');
  });
});
