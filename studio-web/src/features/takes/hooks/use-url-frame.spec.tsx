import { act, render, screen } from '@testing-library/react';
import { useReducer } from 'react';
import { MemoryRouter, useLocation, useNavigate } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { takeFrameRange } from '../transport/shot-frames';
import { initialTransport, transportReducer } from '../transport/transport-state';
import { readFrameParam, URL_SYNC_DELAY_MS, useUrlFrame } from './use-url-frame';

const FRAME_START = 1001;

function Player() {
  const [state, dispatch] = useReducer(transportReducer, undefined, () =>
    initialTransport(takeFrameRange(FRAME_START, 100), 24),
  );
  useUrlFrame(state, dispatch);
  const location = useLocation();
  const navigate = useNavigate();
  return (
    <>
      <output data-testid="frame">{state.frame}</output>
      <output data-testid="search">{location.search}</output>
      <button onClick={() => dispatch({ type: 'step', by: 1 })}>step</button>
      <button onClick={() => navigate('?frame=1050')}>note</button>
    </>
  );
}

const show = (search: string) =>
  render(
    <MemoryRouter initialEntries={[`/shows/s/takes/t${search}`]}>
      <Player />
    </MemoryRouter>,
  );

describe('useUrlFrame', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('reads whole frame numbers only', () => {
    expect(readFrameParam(new URLSearchParams('frame=1012'))).toBe(1012);
    expect(readFrameParam(new URLSearchParams('frame=12.5'))).toBeNull();
    expect(readFrameParam(new URLSearchParams(''))).toBeNull();
  });

  it('opens on the shot frame of the address', () => {
    show('?frame=1012');
    expect(screen.getByTestId('frame').textContent).toBe('1012');
  });

  it('clamps an address frame outside the shot to its ends', () => {
    show('?frame=5');
    expect(screen.getByTestId('frame').textContent).toBe('1001');
  });

  it('jumps when the address changes (a note link) and writes the paused frame back', () => {
    show('?frame=1012');
    act(() => screen.getByText('note').click());
    expect(screen.getByTestId('frame').textContent).toBe('1050');
    act(() => screen.getByText('step').click());
    expect(screen.getByTestId('search').textContent).toBe('?frame=1050');
    act(() => vi.advanceTimersByTime(URL_SYNC_DELAY_MS + 10));
    expect(screen.getByTestId('search').textContent).toBe('?frame=1051');
  });
});
