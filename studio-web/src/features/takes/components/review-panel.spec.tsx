import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import type { Take } from '../api/take-view';
import { ReviewPanel } from './review-panel';

const TAKE: Take = {
  id: 'take-1',
  shotId: 'shot-1',
  version: 3,
  jobId: 'job-1',
  solveState: 'solved',
  controls: {},
  metrics: null,
  files: ['takes/take-1.glb'],
  reviewState: 'awaiting_review',
  createdBy: null,
  createdAt: '2030-01-01T10:00:00.000Z',
  reviewedAt: null,
};

function renderPanel(take: Take, can: { write: boolean; resolve: boolean; decide: boolean }) {
  return renderWithProviders(
    <MemoryRouter>
      <ReviewPanel
        showId="show-1"
        take={take}
        shotFrame={1010}
        userId="user-1"
        isAdmin={false}
        canWrite={can.write}
        canResolve={can.resolve}
        canDecide={can.decide}
        drawing={false}
        onDrawingChange={vi.fn()}
        draft={[]}
        onDraftChange={vi.fn()}
        onJump={vi.fn()}
      />
    </MemoryRouter>,
  );
}

describe('ReviewPanel', () => {
  it('shows the review state in words and no decision or note form to a producer', async () => {
    mockFetch(() => jsonResponse([]));
    renderPanel(TAKE, { write: false, resolve: false, decide: false });
    expect(screen.getByTestId('review-state').textContent).toBe('Awaiting review');
    await screen.findByText('No notes on this take yet.');
    expect(screen.queryByTestId('decision-actions')).toBeNull();
    expect(screen.queryByTestId('note-form')).toBeNull();
  });

  it('approves only after the confirmation, sending the comment', async () => {
    const spy = mockFetch((url, init) =>
      init.method === 'POST'
        ? jsonResponse({
            id: 'd1',
            takeId: 'take-1',
            decision: 'approved',
            comment: 'Lovely settle.',
            supervisor: { id: 'user-1', displayName: 'Sam' },
            at: '2030-01-02T10:00:00.000Z',
          })
        : url.endsWith('/decisions') || url.endsWith('/notes')
          ? jsonResponse([])
          : jsonResponse({ ...TAKE, reviewState: 'approved' }),
    );
    renderPanel(TAKE, { write: true, resolve: true, decide: true });
    fireEvent.click(screen.getByRole('button', { name: 'Approve…' }));
    const dialog = await screen.findByRole('alertdialog');
    within(dialog).getByText('Approve this take?');
    expect(spy.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);

    fireEvent.change(within(dialog).getByLabelText('Comment (optional)'), {
      target: { value: 'Lovely settle.' },
    });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Approve take' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    const post = spy.mock.calls.find(([, init]) => init?.method === 'POST');
    expect(post?.[0]).toBe('/api/shows/show-1/takes/take-1/decisions');
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({
      decision: 'approved',
      comment: 'Lovely settle.',
    });
  });

  it('offers no decision once the take is decided', async () => {
    mockFetch(() => jsonResponse([]));
    renderPanel(
      { ...TAKE, reviewState: 'changes_requested' },
      { write: true, resolve: true, decide: true },
    );
    expect(screen.getByTestId('review-state').textContent).toBe('Changes requested');
    await screen.findByText('No notes on this take yet.');
    expect(screen.queryByTestId('decision-actions')).toBeNull();
  });
});
