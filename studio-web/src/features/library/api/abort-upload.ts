// DELETE /api/shows/:showId/uploads/:assetId: drop an upload that has not completed.
import { apiRequest } from '@/lib/api-client';
import { showPath } from './library-keys';

/** Aborts an open upload: its parts and its records are removed. */
export async function abortUpload(showId: string, assetId: string): Promise<void> {
  await apiRequest(`${showPath(showId)}/uploads/${encodeURIComponent(assetId)}`, {
    method: 'DELETE',
  });
}
