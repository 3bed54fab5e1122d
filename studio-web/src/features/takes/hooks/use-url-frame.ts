// Keeps the `?frame=` of the address and the player's frame in step: the address says where to
// start and where a note link jumps to; a paused player writes its frame back so the address can
// be shared.
import { useEffect, type Dispatch } from 'react';
import { useSearchParams } from 'react-router-dom';
import { frameIndexOf, shotFrameOf } from '../review/note-frames';
import type { TransportAction } from '../transport/transport-state';

/** Pause before the address follows the frame, so stepping does not flood the history. */
export const URL_SYNC_DELAY_MS = 300;

/** The shot frame number in the address, or null when absent or not a whole number. */
export function readFrameParam(search: URLSearchParams): number | null {
  const raw = search.get('frame');
  if (raw === null || !/^-?\d+$/.test(raw.trim())) return null;
  return Number(raw);
}

/** Seeks when the address's frame changes, and writes the frame back while paused. */
export function useUrlFrame(
  transport: { frame: number; playing: boolean; frameCount: number },
  frameStart: number,
  dispatch: Dispatch<TransportAction>,
): void {
  const [search, setSearch] = useSearchParams();
  const urlFrame = readFrameParam(search);
  const { frame, playing, frameCount } = transport;

  useEffect(() => {
    if (urlFrame === null) return;
    dispatch({ type: 'seek', frame: frameIndexOf(urlFrame, frameStart, frameCount) });
  }, [urlFrame, frameStart, frameCount, dispatch]);

  useEffect(() => {
    if (playing) return;
    const shotFrame = shotFrameOf(frame, frameStart);
    if (shotFrame === urlFrame) return;
    const timer = window.setTimeout(() => {
      setSearch(
        (prev) => {
          const next = new URLSearchParams(prev);
          next.set('frame', String(shotFrame));
          return next;
        },
        { replace: true, preventScrollReset: true },
      );
    }, URL_SYNC_DELAY_MS);
    return () => window.clearTimeout(timer);
    // urlFrame is read, not followed: the address changing must not re-arm this write.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [frame, playing, frameStart, setSearch]);
}
