// GET /api/shows/:showId/members: the people of a show, to choose assignees from.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import { asArray } from '@/lib/parse-answer';
import { parseMember } from './shot-types';
import { shotKeys } from './shot-keys';

/** Fetches the show's members. */
export function getMembers(showId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/members`, { signal }, (v) =>
    asArray(v, 'member list').map(parseMember),
  );
}

/** Query options for the show's members. */
export function getMembersQueryOptions(showId: string) {
  return queryOptions({
    queryKey: shotKeys.members(showId),
    queryFn: ({ signal }) => getMembers(showId, { signal }),
    staleTime: 60_000,
  });
}

/** The show's members. */
export function useMembers(showId: string) {
  return useQuery(getMembersQueryOptions(showId));
}
