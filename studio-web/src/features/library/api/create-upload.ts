// POST /api/shows/:showId/uploads: record a file and get presigned URLs for its parts.
import { apiRequest } from '@/lib/api-client';
import { showPath } from './library-keys';
import { parseOpenUpload, type CreateUploadInput, type OpenUpload } from './upload-types';

/** Opens an upload (captures need `characterId` and the consent record). */
export function createUpload(
  showId: string,
  input: CreateUploadInput,
  { signal }: { signal?: AbortSignal } = {},
): Promise<OpenUpload> {
  return apiRequest(
    `${showPath(showId)}/uploads`,
    { method: 'POST', body: input, signal },
    parseOpenUpload,
  );
}
