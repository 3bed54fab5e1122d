// GET /api/admin/shows/:showId/tokens: a show's pipeline tokens, without secrets.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseTokens, type PipelineToken } from './pipeline-token';

/** Fetches a show's tokens. */
export function getTokens(
  showId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<PipelineToken[]> {
  return apiRequest(`/admin/shows/${encodeURIComponent(showId)}/tokens`, { signal }, parseTokens);
}

/** Query options for a show's tokens. */
export function getTokensQueryOptions(showId: string) {
  return queryOptions({
    queryKey: ['admin', 'shows', showId, 'tokens'],
    queryFn: ({ signal }) => getTokens(showId, { signal }),
  });
}

/** A show's tokens. */
export function useTokens(showId: string) {
  return useQuery(getTokensQueryOptions(showId));
}
