// GET /api/shows: the shows the signed-in user is a member of (admins: all).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseShows, type Show } from './show';

/** Fetches the caller's open (not archived) shows. */
export function getShows({ signal }: { signal?: AbortSignal } = {}): Promise<Show[]> {
  return apiRequest('/shows', { signal }, parseShows);
}

/** Query options for the caller's shows; admin changes to shows invalidate ['shows']. */
export function getShowsQueryOptions() {
  return queryOptions({
    queryKey: ['shows', 'mine'],
    queryFn: ({ signal }) => getShows({ signal }),
  });
}

/** The caller's shows. */
export function useShows() {
  return useQuery(getShowsQueryOptions());
}
