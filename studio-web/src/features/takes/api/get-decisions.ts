// GET /api/shows/:showId/takes/:takeId/decisions: the take's review decisions.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseDecisions, type ReviewDecision } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** Fetches the decisions on a take. */
export function getDecisions(
  showId: string,
  takeId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ReviewDecision[]> {
  return apiRequest(
    `${showPath(showId)}/takes/${encodeURIComponent(takeId)}/decisions`,
    { signal },
    parseDecisions,
  );
}

/** Query options for the decisions on a take. */
export function getDecisionsQueryOptions(showId: string, takeId: string) {
  return queryOptions({
    queryKey: takeKeys.decisions(showId, takeId),
    queryFn: ({ signal }) => getDecisions(showId, takeId, { signal }),
  });
}

/** The decisions on a take. */
export function useDecisions(showId: string, takeId: string) {
  return useQuery(getDecisionsQueryOptions(showId, takeId));
}
