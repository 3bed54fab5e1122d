// POST /api/shows/:showId/uploads/:assetId/complete: join the parts and queue the file's check.
import { apiRequest } from '@/lib/api-client';
import { showPath } from './library-keys';
import { parseAsset, type Asset } from './library-types';

/** One uploaded part and the ETag the S3 store answered. */
export interface UploadedPart {
  partNumber: number;
  etag: string;
}

/** Completes an upload; the file is then checked in the background. */
export function completeUpload(
  showId: string,
  assetId: string,
  parts: UploadedPart[],
  { signal }: { signal?: AbortSignal } = {},
): Promise<Asset> {
  return apiRequest(
    `${showPath(showId)}/uploads/${encodeURIComponent(assetId)}/complete`,
    { method: 'POST', body: { parts }, signal },
    parseAsset,
  );
}
