// Keeps the `?frame=` of the address and the player's frame in step: the address says where to
// start and where a note link jumps to; a paused player writes its frame back so the address can
// be shared.
import { useEffect, type Dispatch } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { TransportAction } from '../transport/transport-state';

/** Pause before the address follows the frame, so stepping does not flood the history. */
export const URL_SYNC_DELAY_MS = 300;

/** The shot frame number in the address, or null when absent or not a whole number. */
export function readFrameParam(search: URLSearchParams): number | null {
  const raw = search.get('frame');
  if (raw === null || !/^-?\d+$/.test(raw.trim())) return null;
  return Number(raw);
}

/**
 * Seeks when the address's frame changes, and writes the frame back while paused. Both are shot
 * frames, like the transport's; the transport keeps a frame outside the shot at its ends.
 */
export function useUrlFrame(
  transport: { frame: number; playing: boolean },
  dispatch: Dispatch<TransportAction>,
): void {
  const [search, setSearch] = useSearchParams();
  const urlFrame = readFrameParam(search);
  const { frame, playing } = transport;

  useEffect(() => {
    if (urlFrame !== null) dispatch({ type: 'seek', frame: urlFrame });
  }, [urlFrame, dispatch]);

  useEffect(() => {
    if (playing) return;
    if (frame === urlFrame) return;
    const timer = window.setTimeout(() => {
      setSearch(
        (prev) => {
          const next = new URLSearchParams(prev);
          next.set('frame', String(frame));
          return next;
        },
        { replace: true, preventScrollReset: true },
      );
    }, URL_SYNC_DELAY_MS);
    return () => window.clearTimeout(timer);
    // urlFrame is read, not followed: the address changing must not re-arm this write.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [frame, playing, setSearch]);
}
