// GET /api/shows/:showId/profiles/:profileId: modes, spectra, fit report and the learn job.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseProfile } from './profile-types';

/** Fetches one profile. */
export function getProfile(showId: string, id: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(
    `${showPath(showId)}/profiles/${encodeURIComponent(id)}`,
    { signal },
    parseProfile,
  );
}

/** Query options for one profile; polls while it learns if `poll`. */
export function getProfileQueryOptions(showId: string, id: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.profile(showId, id),
    queryFn: ({ signal }) => getProfile(showId, id, { signal }),
    refetchInterval: (query) => {
      const state = query.state.data?.state;
      return poll && (state === 'queued' || state === 'learning') ? LIBRARY_POLL_MS : false;
    },
  });
}

/** One profile. */
export function useProfile(showId: string, id: string, { poll = false }: { poll?: boolean } = {}) {
  return useQuery(getProfileQueryOptions(showId, id, poll));
}
