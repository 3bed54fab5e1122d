// GET /api/shows/:showId/shots/summary: counts by state and the late shots.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseShotSummary, type ShotSummary } from './shot-summary';

/** Fetches the show's shot counts and late shots. */
export function getShotSummary(
  showId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ShotSummary> {
  return apiRequest(
    `/shows/${encodeURIComponent(showId)}/shots/summary`,
    { signal },
    parseShotSummary,
  );
}

/** Query options for the summary. */
export function getShotSummaryQueryOptions(showId: string) {
  return queryOptions({
    queryKey: ['shows', showId, 'shots', 'summary'],
    queryFn: ({ signal }) => getShotSummary(showId, { signal }),
  });
}

/** The show's shot counts and late shots. */
export function useShotSummary(showId: string) {
  return useQuery(getShotSummaryQueryOptions(showId));
}
