// What the worker reports about a show's long work, as it travels through Redis to every API
// process and on to the browsers watching that show.
import type { AssetKind, AssetState } from '../assets/entities/asset.entity';
import type { JobState } from '../jobs/job-state';

/** Ingest progress of an uploaded file; `state` turns ready or rejected at the end. */
export interface AssetProgressEvent {
  assetId: string;
  kind: AssetKind;
  stage: string;
  percent: number;
  state: AssetState;
}

/** Which queue a job runs in: learning builds a profile, retargeting a take. */
export type JobKind = 'learn' | 'retarget';

/** The ids that say which job an event is about. */
export interface JobRef {
  jobId: string;
  kind: JobKind;
  /** The shot of a retarget job. */
  shotId?: string | null;
  /** The profile a learn job builds, or a retarget job applies. */
  profileId?: string | null;
}

/** A job's stage and percent while it runs. */
export interface JobProgressEvent extends JobRef {
  stage: string;
  percent: number;
}

/** A job's state changed (queued, solving, solved, failed, canceled). */
export interface JobStateEvent extends JobRef {
  state: JobState;
  errorCode?: string | null;
  errorMessage?: string | null;
}

/** A retarget job's take is written and can be played. */
export interface TakeReadyEvent {
  takeId: string;
  shotId: string;
  jobId: string;
  version: number;
}

/** Event name → its data, as sent on the stream (`event:` line → `data:` JSON). */
export interface ShowEventData {
  'asset.progress': AssetProgressEvent;
  'job.progress': JobProgressEvent;
  'job.state': JobStateEvent;
  'take.ready': TakeReadyEvent;
}

/** A stream event name. */
export type ShowEventType = keyof ShowEventData;

/** Every event name, for checking what arrives from Redis. */
export const SHOW_EVENT_TYPES: readonly ShowEventType[] = [
  'asset.progress',
  'job.progress',
  'job.state',
  'take.ready',
];

/** One event of a show, as published on Redis; `at` is when the worker reported it. */
export interface ShowEvent<T extends ShowEventType = ShowEventType> {
  showId: string;
  type: T;
  data: ShowEventData[T] & { at: string };
}

/** The Redis pub/sub channel of a deployment (its key prefix keeps test and demo apart). */
export const showEventsChannel = (redisPrefix: string) => `${redisPrefix}:show-events`;

/** Parses a message from the channel; null for anything that is not a show event. */
export function parseShowEvent(message: string): ShowEvent | null {
  try {
    const e = JSON.parse(message) as Partial<ShowEvent>;
    const ok =
      typeof e.showId === 'string' &&
      SHOW_EVENT_TYPES.includes(e.type as ShowEventType) &&
      typeof e.data === 'object' &&
      e.data !== null;
    return ok ? (e as ShowEvent) : null;
  } catch {
    return null;
  }
}
