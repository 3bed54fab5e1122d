// Ticks the transport once per display frame while it plays.
import { useEffect, type Dispatch } from 'react';
import type { TransportAction } from '../transport/transport-state';

/** While `playing`, sends `tick` with the seconds since the last display frame. */
export function usePlaybackClock(playing: boolean, dispatch: Dispatch<TransportAction>): void {
  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    let request = requestAnimationFrame(function step(now) {
      dispatch({ type: 'tick', seconds: Math.max(0, now - last) / 1000 });
      last = now;
      request = requestAnimationFrame(step);
    });
    return () => cancelAnimationFrame(request);
  }, [playing, dispatch]);
}
