// GET /api/shows/:showId/{characters,captures,clips}/:id/file: a short-lived download link,
// then the file's bytes from the S3 store.
import { apiRequest } from '@/lib/api-client';
import { showPath } from './library-keys';
import { parseFileLink, type AssetKind, type FileLink } from './library-types';

/** Fetches a download link for a library item's file. */
export function getFileLink(
  showId: string,
  kind: AssetKind,
  id: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<FileLink> {
  return apiRequest(
    `${showPath(showId)}/${kind}s/${encodeURIComponent(id)}/file`,
    { signal },
    parseFileLink,
  );
}

/** Downloads a library item's file; throws an Error saying which file could not be read. */
export async function downloadFile(
  showId: string,
  kind: AssetKind,
  id: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ArrayBuffer> {
  const link = await getFileLink(showId, kind, id, { signal });
  const response = await fetch(link.url, { signal });
  if (!response.ok) {
    throw new Error(
      `The file store answered HTTP ${response.status} for ${link.fileName || kind}.`,
    );
  }
  return response.arrayBuffer();
}
