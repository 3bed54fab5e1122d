// GET /api/shows/:showId/shots/:shotId/takes: the shot's takes, newest first.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import { asArray } from '@/lib/parse-answer';
import { parseTake } from './shot-types';
import { shotKeys } from './shot-keys';

/** Fetches a shot's takes. */
export function getShotTakes(
  showId: string,
  shotId: string,
  { signal }: { signal?: AbortSignal } = {},
) {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}/takes`,
    { signal },
    (v) => asArray(v, 'take list').map(parseTake),
  );
}

/** Query options for a shot's takes. */
export function getShotTakesQueryOptions(showId: string, shotId: string) {
  return queryOptions({
    queryKey: shotKeys.takes(showId, shotId),
    queryFn: ({ signal }) => getShotTakes(showId, shotId, { signal }),
  });
}

/** A shot's takes. */
export function useShotTakes(showId: string, shotId: string) {
  return useQuery(getShotTakesQueryOptions(showId, shotId));
}
