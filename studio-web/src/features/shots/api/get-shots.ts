// GET /api/shows/:showId/shots: the server-paged, sorted, filtered shot table.
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { JobState } from '@/features/library/api/job-view';
import { showPath } from '@/features/library/api/library-keys';
import type { RenderState, ReviewState } from './shot-types';
import { parseShotPage } from './shot-types';
import { shotKeys } from './shot-keys';

/** Query of the shot table; every field optional, as the API's list query. */
export interface ShotListParams {
  page?: number;
  pageSize?: number;
  /** `field:asc|desc[,…]`, e.g. `dueDate:asc,code:asc`. */
  sort?: string;
  search?: string;
  sequence?: string;
  solveState?: JobState | 'none';
  reviewState?: ReviewState | 'none';
  renderState?: RenderState;
  late?: boolean;
  assigneeId?: string;
}

/** The query string for the list (only the fields that are set). */
export function shotListQuery(params: ShotListParams): string {
  const q = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== '' && value !== null) q.set(key, String(value));
  }
  const s = q.toString();
  return s ? `?${s}` : '';
}

/** Fetches one page of shots. */
export function getShots(
  showId: string,
  params: ShotListParams,
  { signal }: { signal?: AbortSignal } = {},
) {
  return apiRequest(`${showPath(showId)}/shots${shotListQuery(params)}`, { signal }, parseShotPage);
}

/** Query options for a page of shots; the previous page stays on screen while the next loads. */
export function getShotsQueryOptions(showId: string, params: ShotListParams) {
  return queryOptions({
    queryKey: shotKeys.list(showId, params),
    queryFn: ({ signal }) => getShots(showId, params, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** A page of the show's shots. */
export function useShots(showId: string, params: ShotListParams) {
  return useQuery(getShotsQueryOptions(showId, params));
}
