// GET /api/shows/:showId/assets/:assetId: an uploaded file's check progress and report.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseAsset } from './library-types';

/** Fetches one uploaded file. */
export function getAsset(showId: string, id: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/assets/${encodeURIComponent(id)}`, { signal }, parseAsset);
}

/** Query options for one uploaded file; polls until its check ends if `poll`. */
export function getAssetQueryOptions(showId: string, id: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.asset(showId, id),
    queryFn: ({ signal }) => getAsset(showId, id, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.state === 'pending' ? LIBRARY_POLL_MS : false,
  });
}

/** One uploaded file's check; idle without an id. */
export function useAsset(showId: string, id: string | undefined, { poll = false } = {}) {
  return useQuery({ ...getAssetQueryOptions(showId, id ?? '', poll), enabled: !!id });
}
