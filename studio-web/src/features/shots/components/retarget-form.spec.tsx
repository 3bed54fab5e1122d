import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SHOW, shotBody } from '@/app/testing/fixtures';
import { calls, meBody, mockApi } from '@/app/testing/mock-api';
import { renderApp } from '@/app/testing/render-app';
import { AppTheme } from '@/components/ui/app-theme';
import { jsonResponse } from '@/testing/mock-fetch';
import { JointMapReview } from './joint-map-review';

const BASE = `/api/shows/${SHOW.id}`;
// The whole app renders in these tests; give a busy machine time.
const SLOW = { timeout: 10_000 };
const SHOT = shotBody('SQ010_0040', { id: 'shot-1', characterId: 'char-1', clipId: 'clip-1' });
const JOINT_MAP = {
  mapped: [{ source: 'Hips', target: 'pelvis' }],
  unmapped: ['Spine1', 'LeftArm'],
  essentialUnmapped: ['Spine1'],
};
const PROFILE = {
  id: 'profile-1',
  name: 'Belly bounce',
  state: 'ready',
  captureId: 'capture-1',
  characterId: 'char-0',
  captureDeleted: false,
  createdAt: '2030-01-03T00:00:00.000Z',
  modes: [{ frequencyHz: 2.1, dampingRatio: 0.12, region: 'belly', energyShare: 0.6 }],
  fitReport: null,
  spectra: null,
  job: null,
};
const CHARACTER = {
  id: 'char-1',
  assetId: 'asset-1',
  state: 'ready',
  validationReport: null,
  name: 'Swimmer',
  version: 1,
  joints: ['pelvis', 'spine_01', 'upperarm_l'],
  regions: ['belly', 'chest'],
  createdAt: '2030-01-01T00:00:00.000Z',
};

function routes(submit: Parameters<typeof mockApi>[0][string] = () => jsonResponse({}, 500)) {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody('technical_artist')),
    'GET /api/shows': () => jsonResponse([SHOW]),
    [`GET ${BASE}/shots/shot-1`]: () => jsonResponse(SHOT),
    [`GET ${BASE}/profiles`]: () => jsonResponse([PROFILE]),
    [`GET ${BASE}/characters/char-1`]: () => jsonResponse(CHARACTER),
    [`GET ${BASE}/shots/shot-1/joint-map`]: () => jsonResponse(JOINT_MAP),
    [`POST ${BASE}/shots/shot-1/jobs`]: submit,
  });
}

const row = (joint: string) =>
  screen
    .getAllByTestId('joint-row')
    .find((r) => r.getAttribute('data-joint') === joint) as HTMLElement;

function fieldError(label: string): string {
  const ids = (screen.getByLabelText(label).getAttribute('aria-describedby') ?? '').split(' ');
  return ids.map((id) => (id ? (document.getElementById(id)?.textContent ?? '') : '')).join(' ');
}

describe('joint map review', { timeout: 30_000 }, () => {
  it('highlights each unmapped joint in words, the ones the solve needs most', async () => {
    routes();
    renderApp(`/shows/${SHOW.id}/shots/shot-1/retarget`);
    await screen.findByTestId('joint-map', {}, SLOW);

    const needed = row('Spine1');
    expect(needed.getAttribute('data-unmapped')).toBe('true');
    expect(needed.className).toContain('joint-unmapped-essential');
    within(needed).getByText('Needed, not mapped');
    const missing = row('LeftArm');
    expect(missing.className).toContain('joint-unmapped');
    expect(missing.className).not.toContain('essential');
    within(missing).getByText('Not mapped');
    const mapped = row('Hips');
    expect(mapped.getAttribute('data-unmapped')).toBe('false');
    expect(mapped.className).not.toContain('joint-unmapped');
    within(mapped).getByText('pelvis');

    expect(screen.getByTestId('joint-map-summary').textContent).toBe(
      '1 of 3 profile joints mapped; 2 not mapped, 1 of them needed by the solve.',
    );
    const alert = screen.getAllByRole('alert').find((a) => a.textContent?.includes('Spine1'));
    expect(alert?.textContent).toContain('or the job will be refused');
  });

  it('stops highlighting a joint once it is mapped by hand', () => {
    render(
      <AppTheme>
        <JointMapReview
          map={JOINT_MAP}
          targetJoints={['spine_01']}
          overrides={{ Spine1: 'spine_01' }}
          onOverride={() => {}}
        />
      </AppTheme>,
    );
    const spine = row('Spine1');
    expect(spine.getAttribute('data-unmapped')).toBe('false');
    expect(spine.className).not.toContain('joint-unmapped');
    within(spine).getByText('Mapped by hand');
    expect(row('LeftArm').getAttribute('data-unmapped')).toBe('true');
    expect(screen.getByTestId('joint-map-summary').textContent).toBe(
      '2 of 3 profile joints mapped; 1 not mapped.',
    );
  });
});

describe('retarget controls', { timeout: 30_000 }, () => {
  it('says what is wrong with each control and sends nothing', async () => {
    const spy = routes();
    renderApp(`/shows/${SHOW.id}/shots/shot-1/retarget`);
    await screen.findByTestId('joint-map', {}, SLOW);
    fireEvent.change(screen.getByLabelText('Stiffness'), { target: { value: '0' } });
    fireEvent.change(screen.getByLabelText('Gain'), { target: { value: '' } });
    fireEvent.change(screen.getByLabelText('belly'), { target: { value: '-2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Submit retarget job' }));

    expect(fieldError('Stiffness')).toContain('enter a number above 0');
    expect(fieldError('Gain')).toContain('Enter a gain');
    expect(fieldError('belly')).toContain('Enter a gain for belly, 0 or more');
    expect(screen.getByLabelText('Damping').getAttribute('aria-invalid')).toBeNull();
    expect(calls(spy).some((c) => c.startsWith('POST'))).toBe(false);
  });

  it('sends only the controls that differ from the defaults, and shows the API’s refusal under its control', async () => {
    let body: unknown;
    routes((_url, init) => {
      body = JSON.parse(String(init.body));
      return jsonResponse(
        {
          code: 'VALIDATION_FAILED',
          message: 'Some fields of the request are not valid.',
          details: [{ field: 'controls.damping', problems: ['damping must be a positive number'] }],
        },
        400,
      );
    });
    renderApp(`/shows/${SHOW.id}/shots/shot-1/retarget`);
    await screen.findByTestId('joint-map', {}, SLOW);
    fireEvent.change(screen.getByLabelText('Gain'), { target: { value: '1.5' } });
    fireEvent.change(screen.getByLabelText('chest'), { target: { value: '0.5' } });
    fireEvent.click(screen.getByRole('button', { name: 'Submit retarget job' }));

    await waitFor(
      () => expect(fieldError('Damping')).toContain('damping must be a positive number'),
      SLOW,
    );
    expect(body).toEqual({
      profileId: 'profile-1',
      controls: { gain: 1.5, regionGains: { chest: 0.5 } },
    });
  });
});
