// GET /api/shows/:showId/captures: the show's captures with their consent records.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseCapture, type Capture } from './library-types';
import { asArray } from '@/lib/parse-answer';

/** Fetches the show's captures (not the deleted ones). */
export function getCaptures(showId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/captures`, { signal }, (v) =>
    asArray(v, 'capture list').map(parseCapture),
  );
}

/** Query options for the capture list; polls while a file is being checked if `poll`. */
export function getCapturesQueryOptions(showId: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.captures(showId),
    queryFn: ({ signal }) => getCaptures(showId, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.some((c: Capture) => c.state === 'pending')
        ? LIBRARY_POLL_MS
        : false,
  });
}

/** The show's captures; idle when the caller's role may not see captures. */
export function useCaptures(showId: string, { poll = false, enabled = true } = {}) {
  return useQuery({ ...getCapturesQueryOptions(showId, poll), enabled });
}
