// GET /api/shows/:showId/clips/:clipId: one clip with its metadata.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys, showPath } from './library-keys';
import { parseClip } from './library-types';

/** Fetches one clip. */
export function getClip(showId: string, id: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/clips/${encodeURIComponent(id)}`, { signal }, parseClip);
}

/** Query options for one clip. */
export function getClipQueryOptions(showId: string, id: string) {
  return queryOptions({
    queryKey: libraryKeys.clip(showId, id),
    queryFn: ({ signal }) => getClip(showId, id, { signal }),
  });
}

/** One clip; idle without an id. */
export function useClip(showId: string, id: string | undefined) {
  return useQuery({ ...getClipQueryOptions(showId, id ?? ''), enabled: !!id });
}
