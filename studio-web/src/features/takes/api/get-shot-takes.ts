// GET /api/shows/:showId/shots/:shotId/takes: the shot's takes, newest first (for compare).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath, takeKeys } from './take-keys';
import { parseTakes, type Take } from './take-view';

/** Fetches the takes of a shot. */
export function getShotTakes(
  showId: string,
  shotId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<Take[]> {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}/takes`,
    { signal },
    parseTakes,
  );
}

/** Query options for the takes of a shot. */
export function getShotTakesQueryOptions(showId: string, shotId: string) {
  return queryOptions({
    queryKey: takeKeys.shotTakes(showId, shotId),
    queryFn: ({ signal }) => getShotTakes(showId, shotId, { signal }),
  });
}

/** The takes of a shot; idle until the shot is known. */
export function useShotTakes(showId: string, shotId: string | undefined) {
  return useQuery({
    ...getShotTakesQueryOptions(showId, shotId ?? ''),
    enabled: shotId !== undefined,
  });
}
