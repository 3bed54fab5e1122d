// GET /api/shows/:showId/shots: one page of the shot table, filtered and sorted by the server.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { apiQuery, type ShotFilters } from './shot-filters';
import { parseShotPage, type ShotPage } from './tracked-shot';

/** Fetches one page of the show's shots matching the filters. */
export function getTrackedShots(
  showId: string,
  filters: ShotFilters,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ShotPage> {
  const path = `/shows/${encodeURIComponent(showId)}/shots${apiQuery(filters, true)}`;
  return apiRequest(path, { signal }, parseShotPage);
}

/** Query options for a page of the table; changes to shots invalidate ['shows', id, 'shots']. */
export function getTrackedShotsQueryOptions(showId: string, filters: ShotFilters) {
  return queryOptions({
    queryKey: ['shows', showId, 'shots', 'list', filters],
    queryFn: ({ signal }) => getTrackedShots(showId, filters, { signal }),
  });
}

/** One page of the table; the previous page stays on screen while the next one loads. */
export function useTrackedShots(showId: string, filters: ShotFilters) {
  return useQuery({
    ...getTrackedShotsQueryOptions(showId, filters),
    placeholderData: keepPreviousData,
  });
}
