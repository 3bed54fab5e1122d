// GET /api/shows/:showId/events: the show's live progress as server-sent events. Pages fall
// back to polling whenever the stream is not open, and refresh on (re)connect because the
// stream does not replay what was missed.
import { useEffect, useRef, useState } from 'react';
import { env } from '@/config/env';
import type { AssetKind, AssetState } from './library-types';
import type { JobKind, JobState } from './job-view';
import { showPath } from './library-keys';

/** Ingest progress of an uploaded file. */
export interface AssetProgressEvent {
  assetId: string;
  kind: AssetKind;
  stage: string;
  percent: number;
  state: AssetState;
}

/** A running job's stage and percent. */
export interface JobProgressEvent {
  jobId: string;
  kind: JobKind;
  shotId?: string | null;
  profileId?: string | null;
  stage: string;
  percent: number;
}

/** A job's new state. */
export interface JobStateEvent {
  jobId: string;
  kind: JobKind;
  shotId?: string | null;
  profileId?: string | null;
  state: JobState;
  errorCode?: string | null;
  errorMessage?: string | null;
}

/** A retarget job's take is written. */
export interface TakeReadyEvent {
  takeId: string;
  shotId: string;
  jobId: string;
  version: number;
}

/** Event name → its data. */
export interface ShowEventData {
  'asset.progress': AssetProgressEvent;
  'job.progress': JobProgressEvent;
  'job.state': JobStateEvent;
  'take.ready': TakeReadyEvent;
}

/** One event from the stream. */
export type ShowEvent = {
  [K in keyof ShowEventData]: { type: K; data: ShowEventData[K] };
}[keyof ShowEventData];

const TYPES: readonly (keyof ShowEventData)[] = [
  'asset.progress',
  'job.progress',
  'job.state',
  'take.ready',
];

/** Handlers of a show's stream: each event, and each time the stream (re)opens. */
export interface ShowEventHandlers {
  onEvent: (event: ShowEvent) => void;
  /** Called when the stream opens; `reconnected` when it had been open before (refresh then). */
  onOpen?: (reconnected: boolean) => void;
}

/**
 * Follows the show's event stream while mounted. `live` is true while the stream is open; when
 * false (not yet open, dropped, refused, or no EventSource at all) the page should poll.
 */
export function useShowEvents(showId: string, handlers: ShowEventHandlers): { live: boolean } {
  const [live, setLive] = useState(false);
  const latest = useRef(handlers);
  useEffect(() => {
    latest.current = handlers;
  });

  useEffect(() => {
    if (typeof EventSource === 'undefined' || !showId) return;
    const source = new EventSource(`${env.apiBaseUrl}${showPath(showId)}/events`);
    const listeners = TYPES.map((type) => {
      const listener = (message: MessageEvent<string>) => {
        try {
          const data = JSON.parse(message.data) as ShowEvent['data'];
          latest.current.onEvent({ type, data } as ShowEvent);
        } catch {
          // A malformed event is skipped; the polling routes hold the truth.
        }
      };
      source.addEventListener(type, listener);
      return [type, listener] as const;
    });
    let opened = false;
    source.onopen = () => {
      setLive(true);
      latest.current.onOpen?.(opened);
      opened = true;
    };
    // The browser reconnects on its own after a drop; until then (or for good, after a refusal)
    // the page polls.
    source.onerror = () => setLive(false);
    return () => {
      for (const [type, listener] of listeners) source.removeEventListener(type, listener);
      source.close();
      setLive(false);
    };
  }, [showId]);

  return { live };
}
