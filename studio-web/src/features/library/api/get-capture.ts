// GET /api/shows/:showId/captures/:captureId: one capture with its consent record.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys, showPath } from './library-keys';
import { parseCapture } from './library-types';

/** Fetches one capture. */
export function getCapture(showId: string, id: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(
    `${showPath(showId)}/captures/${encodeURIComponent(id)}`,
    { signal },
    parseCapture,
  );
}

/** Query options for one capture. */
export function getCaptureQueryOptions(showId: string, id: string) {
  return queryOptions({
    queryKey: libraryKeys.capture(showId, id),
    queryFn: ({ signal }) => getCapture(showId, id, { signal }),
  });
}

/** One capture; idle without an id. */
export function useCapture(showId: string, id: string | undefined) {
  return useQuery({ ...getCaptureQueryOptions(showId, id ?? ''), enabled: !!id });
}
