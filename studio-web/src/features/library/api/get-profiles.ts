// GET /api/shows/:showId/profiles: the show's tissue profiles, newest first.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseProfile, type Profile } from './profile-types';
import { asArray } from '@/lib/parse-answer';

/** Fetches the show's profiles. */
export function getProfiles(showId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/profiles`, { signal }, (v) =>
    asArray(v, 'profile list').map(parseProfile),
  );
}

const learning = (p: Profile) => p.state === 'queued' || p.state === 'learning';

/** Query options for the profile list; polls while one is learning if `poll`. */
export function getProfilesQueryOptions(showId: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.profiles(showId),
    queryFn: ({ signal }) => getProfiles(showId, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.some(learning) ? LIBRARY_POLL_MS : false,
  });
}

/** The show's profiles. */
export function useProfiles(showId: string, { poll = false }: { poll?: boolean } = {}) {
  return useQuery(getProfilesQueryOptions(showId, poll));
}
