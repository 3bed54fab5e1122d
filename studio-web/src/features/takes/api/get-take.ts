// GET /api/shows/:showId/takes/:takeId: one take with its controls and review state.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath, takeKeys } from './take-keys';
import { parseTake, type Take } from './take-view';

/** Fetches one take. */
export function getTake(
  showId: string,
  takeId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<Take> {
  return apiRequest(
    `${showPath(showId)}/takes/${encodeURIComponent(takeId)}`,
    { signal },
    parseTake,
  );
}

/** Query options for one take. */
export function getTakeQueryOptions(showId: string, takeId: string) {
  return queryOptions({
    queryKey: takeKeys.take(showId, takeId),
    queryFn: ({ signal }) => getTake(showId, takeId, { signal }),
  });
}

/** One take. */
export function useTake(showId: string, takeId: string) {
  return useQuery(getTakeQueryOptions(showId, takeId));
}
