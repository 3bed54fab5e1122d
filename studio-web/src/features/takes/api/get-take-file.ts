// GET /api/shows/:showId/takes/:takeId/file: the take .glb (binary), for the viewer and live tuning.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';
import { showPath, takeKeys } from './take-keys';

/** Downloads the take file's bytes. */
export async function getTakeFile(
  showId: string,
  takeId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ArrayBuffer> {
  const path = `${showPath(showId)}/takes/${encodeURIComponent(takeId)}/file`;
  const { blob } = await apiDownload(path, { signal, accept: 'model/gltf-binary' });
  return blob.arrayBuffer();
}

/** Query options for a take file: a take is written once, so its bytes never go stale. */
export function getTakeFileQueryOptions(showId: string, takeId: string) {
  return queryOptions({
    queryKey: takeKeys.file(showId, takeId),
    queryFn: ({ signal }) => getTakeFile(showId, takeId, { signal }),
    staleTime: Infinity,
    // A few megabytes each: keep a minute after the last viewer closed, then free them.
    gcTime: 60_000,
  });
}

/** The bytes of a take's .glb; idle while there is no take id. */
export function useTakeFile(showId: string, takeId: string | undefined) {
  return useQuery({
    ...getTakeFileQueryOptions(showId, takeId ?? ''),
    enabled: takeId !== undefined,
  });
}
