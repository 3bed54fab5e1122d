// GET /api/admin/shows?archived=true: every show, archived ones included.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { parseShows, type Show } from '@/features/shows';
import { apiRequest } from '@/lib/api-client';

/** Fetches every show, archived included. */
export function getAdminShows({ signal }: { signal?: AbortSignal } = {}): Promise<Show[]> {
  return apiRequest('/admin/shows?archived=true', { signal }, parseShows);
}

/** Query options for every show; show changes invalidate ['shows']. */
export function getAdminShowsQueryOptions() {
  return queryOptions({
    queryKey: ['shows', 'admin'],
    queryFn: ({ signal }) => getAdminShows({ signal }),
  });
}

/** Every show, archived included. */
export function useAdminShows() {
  return useQuery(getAdminShowsQueryOptions());
}
