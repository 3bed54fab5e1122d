// GET /api/shows/:showId/clips?includeRejected=true: the show's clips.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseClip, type Clip } from './library-types';
import { asArray } from '@/lib/parse-answer';

/** Fetches the show's clips, refused uploads included (they carry their report). */
export function getClips(showId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/clips?includeRejected=true`, { signal }, (v) =>
    asArray(v, 'clip list').map(parseClip),
  );
}

/** Query options for the clip list; polls while a file is being checked if `poll`. */
export function getClipsQueryOptions(showId: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.clips(showId),
    queryFn: ({ signal }) => getClips(showId, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.some((c: Clip) => c.state === 'pending') ? LIBRARY_POLL_MS : false,
  });
}

/** The show's clips. */
export function useClips(showId: string, { poll = false }: { poll?: boolean } = {}) {
  return useQuery(getClipsQueryOptions(showId, poll));
}
