import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import type { Note } from '../api/note-view';
import { NotesPanel } from './notes-panel';

const note = (id: string, frame: number, extra: Partial<Note> = {}) => ({
  id,
  takeId: 'take-1',
  frame,
  text: `note ${id}`,
  mark: null,
  author: { id: 'user-sup', displayName: 'Sam Supervisor' },
  resolved: false,
  resolvedBy: null,
  resolvedAt: null,
  createdAt: `2030-01-0${id.length}T10:00:00.000Z`,
  updatedAt: '2030-01-01T10:00:00.000Z',
  ...extra,
});

function Where() {
  const location = useLocation();
  return <output data-testid="where">{`${location.pathname}${location.search}`}</output>;
}

function renderPanel(onJump = vi.fn(), canResolve = false) {
  renderWithProviders(
    <MemoryRouter initialEntries={['/shows/show-1/takes/take-1?frame=1001']}>
      <Routes>
        <Route
          path="/shows/:showId/takes/:takeId"
          element={
            <>
              <NotesPanel
                showId="show-1"
                takeId="take-1"
                shotFrame={1020}
                userId="user-anim"
                isAdmin={false}
                canResolve={canResolve}
                onJump={onJump}
              />
              <Where />
            </>
          }
        />
      </Routes>
    </MemoryRouter>,
  );
  return onJump;
}

describe('NotesPanel', () => {
  it('lists notes by frame and jumps to a note’s frame when its frame is clicked', async () => {
    const spy = mockFetch(() =>
      jsonResponse([
        note('bb', 1040),
        note('a', 1012, { mark: { strokes: [{ points: [[0.2, 0.3]] }] } }),
      ]),
    );
    const onJump = renderPanel();
    const items = await screen.findAllByTestId('note-item');
    expect(items.map((i) => within(i).getByRole('link').textContent)).toEqual(['1012', '1040']);
    expect(spy.mock.calls[0][0]).toBe('/api/shows/show-1/takes/take-1/notes');

    fireEvent.click(screen.getByRole('link', { name: 'Go to frame 1012' }));

    expect(onJump).toHaveBeenCalledWith(expect.objectContaining({ id: 'a', frame: 1012 }));
    await waitFor(() =>
      expect(screen.getByTestId('where').textContent).toBe('/shows/show-1/takes/take-1?frame=1012'),
    );
    within(items[0]).getByText('Has a mark');
  });

  it('marks the notes of the frame on screen, and shows state as a word', async () => {
    mockFetch(() => jsonResponse([note('a', 1020), note('bb', 1030, { resolved: true })]));
    renderPanel();
    const items = await screen.findAllByTestId('note-item');
    expect(items[0].hasAttribute('data-here')).toBe(true);
    expect(items[1].hasAttribute('data-here')).toBe(false);
    within(items[0]).getByText('Open');
    within(items[1]).getByText('Resolved');
  });

  it('offers resolve only to those who may, and edit only to the author', async () => {
    mockFetch(() =>
      jsonResponse([
        note('a', 1020),
        note('bb', 1030, { author: { id: 'user-anim', displayName: 'Ann' } }),
      ]),
    );
    renderPanel(vi.fn(), false);
    const items = await screen.findAllByTestId('note-item');
    expect(screen.queryByRole('button', { name: 'Resolve' })).toBeNull();
    expect(within(items[0]).queryByRole('button', { name: 'Edit' })).toBeNull();
    within(items[1]).getByRole('button', { name: 'Edit' });
  });

  it('resolves a note for a supervisor and asks for the list again', async () => {
    const spy = mockFetch((url, init) =>
      init.method === 'POST'
        ? jsonResponse(note('a', 1020, { resolved: true }))
        : jsonResponse([note('a', 1020)]),
    );
    renderPanel(vi.fn(), true);
    fireEvent.click(await screen.findByRole('button', { name: 'Resolve' }));
    await waitFor(() => expect(spy.mock.calls.length).toBeGreaterThanOrEqual(3));
    const post = spy.mock.calls.find(([, init]) => init?.method === 'POST');
    expect(post?.[0]).toBe('/api/shows/show-1/notes/a/resolve');
  });
});
