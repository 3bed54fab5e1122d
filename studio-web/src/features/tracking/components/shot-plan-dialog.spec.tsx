import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SHOW, shotBody, shotPageBody, summaryBody, throughputBody } from '@/app/testing/fixtures';
import { calls, meBody, mockApi, type ApiHandler } from '@/app/testing/mock-api';
import { renderApp } from '@/app/testing/render-app';
import { jsonResponse } from '@/testing/mock-fetch';

const SLOW = { timeout: 15_000 };
const TAM = { id: 'u2', displayName: 'Tam Artist' };
const SHOT = shotBody('SQ010_0020', { dueDate: '2999-01-01', assignees: [TAM] });
const member = (userId: string, displayName: string, role = 'animator') => ({
  userId,
  displayName,
  email: `${userId}@studio.example`,
  role,
  disabled: false,
  since: '2030-01-01T00:00:00.000Z',
});

function api(extra: Record<string, ApiHandler> = {}, shot = SHOT) {
  return mockApi({
    'GET /api/auth/me': () => jsonResponse(meBody('producer')),
    'GET /api/shows': () => jsonResponse([SHOW]),
    'GET /api/shows/show-1/members': () =>
      jsonResponse([member('u2', 'Tam Artist', 'technical_artist'), member('u3', 'Ash Animator')]),
    'GET /api/shows/show-1/shots/summary': () => jsonResponse(summaryBody({ total: 1 })),
    'GET /api/shows/show-1/shots/throughput': () => jsonResponse(throughputBody([0])),
    'GET /api/shows/show-1/shots': () => jsonResponse(shotPageBody([shot])),
    ...extra,
  });
}

async function openDialog() {
  renderApp('/shows/show-1/tracking');
  fireEvent.click(await screen.findByRole('button', { name: /Update… SQ010_0020/ }, SLOW));
  const dialog = await screen.findByRole('dialog', {}, SLOW);
  await within(dialog).findByText('Ash Animator', {}, SLOW);
  return dialog;
}

describe('updating a shot from the tracking table', { timeout: 30_000 }, () => {
  it('sends the due date and assignees, then the render state, and closes', async () => {
    const bodies: unknown[] = [];
    const echo: ApiHandler = (_, init) => {
      bodies.push(JSON.parse(String(init.body)));
      return jsonResponse(SHOT);
    };
    const spy = api({
      'PATCH /api/shows/show-1/shots/shot-SQ010_0020': echo,
      'PUT /api/shows/show-1/shots/shot-SQ010_0020/render-state': echo,
    });
    const dialog = await openDialog();
    fireEvent.change(within(dialog).getByLabelText('Due date'), {
      target: { value: '2020-01-05' },
    });
    within(dialog).getByText(/In the past: the shot counts as late/);
    fireEvent.click(within(dialog).getByRole('checkbox', { name: 'Ash Animator' }));
    fireEvent.click(within(dialog).getByRole('checkbox', { name: 'Tam Artist' }));
    fireEvent.click(within(dialog).getByRole('radio', { name: 'Queued' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull(), SLOW);
    expect(bodies).toEqual([{ dueDate: '2020-01-05', assigneeIds: ['u3'] }, { state: 'queued' }]);
    const sent = calls(spy);
    const patchAt = sent.indexOf('PATCH /api/shows/show-1/shots/shot-SQ010_0020');
    // The table asks again after the change.
    expect(sent.slice(patchAt).some((c) => c.startsWith('GET /api/shows/show-1/shots?'))).toBe(
      true,
    );
  });

  it('offers only the render moves the API allows from the current state', async () => {
    api({}, { ...SHOT, renderState: 'rendering' });
    const dialog = await openDialog();
    const choices = within(dialog)
      .getAllByRole('radio')
      .map((r) => r.closest('label')?.textContent);
    expect(choices).toEqual(['Renderingnow', 'Rendered', 'Failed']);
  });

  it('shows each refusal of the API under its field and stays open', async () => {
    api({
      'PATCH /api/shows/show-1/shots/shot-SQ010_0020': () =>
        jsonResponse(
          {
            code: 'VALIDATION_FAILED',
            message: 'Some fields of the request are not valid.',
            details: [{ field: 'dueDate', problems: ['dueDate must be a date YYYY-MM-DD'] }],
          },
          400,
        ),
    });
    const dialog = await openDialog();
    fireEvent.change(within(dialog).getByLabelText('Due date'), {
      target: { value: '2030-02-30' },
    });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    const problem = await within(dialog).findByText('dueDate must be a date YYYY-MM-DD', {}, SLOW);
    expect(within(dialog).getByLabelText('Due date').getAttribute('aria-describedby')).toContain(
      problem.id,
    );
  });

  it('says under the render state which moves are allowed when the API refuses one', async () => {
    api({
      'PUT /api/shows/show-1/shots/shot-SQ010_0020/render-state': () =>
        jsonResponse(
          {
            code: 'RENDER_STATE_INVALID_TRANSITION',
            message: 'The render state cannot go from rendered to queued.',
            details: { from: 'rendered', to: 'queued', allowed: ['queued'] },
          },
          409,
        ),
    });
    const dialog = await openDialog();
    fireEvent.click(within(dialog).getByRole('radio', { name: 'Queued' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    await within(dialog).findByText(
      'The render state cannot go from Rendered to Queued. From Rendered it can go to Queued.',
      {},
      SLOW,
    );
    expect(screen.getByRole('dialog')).toBeTruthy();
  });
});
