// POST /api/shows/:showId/uploads/:assetId/parts: fresh URLs for some parts (retry, resume).
import { apiRequest } from '@/lib/api-client';
import { showPath } from './library-keys';
import { asObject } from '@/lib/parse-answer';
import { parsePartUrls, type PartUrl } from './upload-types';

/** Presigns the given parts of an open upload again. */
export function signUploadParts(
  showId: string,
  assetId: string,
  partNumbers: number[],
  { signal }: { signal?: AbortSignal } = {},
): Promise<PartUrl[]> {
  return apiRequest(
    `${showPath(showId)}/uploads/${encodeURIComponent(assetId)}/parts`,
    { method: 'POST', body: { partNumbers }, signal },
    (v) => parsePartUrls(asObject(v, 'part URLs').parts),
  );
}
