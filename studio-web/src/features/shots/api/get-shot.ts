// GET /api/shows/:showId/shots/:shotId: one shot.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import { parseShot } from './shot-types';
import { shotKeys } from './shot-keys';

/** Fetches one shot. */
export function getShot(showId: string, id: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/shots/${encodeURIComponent(id)}`, { signal }, parseShot);
}

/** Query options for one shot. */
export function getShotQueryOptions(showId: string, id: string) {
  return queryOptions({
    queryKey: shotKeys.detail(showId, id),
    queryFn: ({ signal }) => getShot(showId, id, { signal }),
  });
}

/** One shot; idle while the id is not known yet. */
export function useShot(showId: string, id: string | undefined) {
  return useQuery({ ...getShotQueryOptions(showId, id ?? ''), enabled: id !== undefined });
}
