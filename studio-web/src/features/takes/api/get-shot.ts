// GET /api/shows/:showId/shots/:shotId: the take's shot, for its code, frame range and rate.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { asObject, num, str } from '@/lib/parse-answer';
import { showPath, takeKeys } from './take-keys';

/** What the take player needs of a shot. */
export interface TakeShot {
  id: string;
  sequence: string;
  code: string;
  /** First and last frame numbers of the shot (inclusive); notes are pinned to these. */
  frameStart: number;
  frameEnd: number;
  fps: number;
}

/** Checks a shot answer and returns the fields the player uses. */
export function parseTakeShot(value: unknown): TakeShot {
  const what = 'shot';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    sequence: str(b, 'sequence', what),
    code: str(b, 'code', what),
    frameStart: num(b, 'frameStart', what),
    frameEnd: num(b, 'frameEnd', what),
    fps: num(b, 'fps', what),
  };
}

/** Fetches a shot. */
export function getShot(
  showId: string,
  shotId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<TakeShot> {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}`,
    { signal },
    parseTakeShot,
  );
}

/** Query options for a shot. */
export function getShotQueryOptions(showId: string, shotId: string) {
  return queryOptions({
    queryKey: takeKeys.shot(showId, shotId),
    queryFn: ({ signal }) => getShot(showId, shotId, { signal }),
  });
}

/** The take's shot; idle until the take is known. */
export function useShot(showId: string, shotId: string | undefined) {
  return useQuery({ ...getShotQueryOptions(showId, shotId ?? ''), enabled: shotId !== undefined });
}
