// PUT of one part straight to its presigned S3 URL. XMLHttpRequest rather than fetch: only it
// reports upload progress, which the per-file bar needs.

/** Options of one part PUT. */
export interface PutPartOptions {
  signal: AbortSignal;
  /** Bytes of this part sent so far. */
  onProgress: (sent: number) => void;
}

/** Sends one part and resolves with the ETag the store answered (needed to complete). */
export type PutPart = (url: string, body: Blob, options: PutPartOptions) => Promise<string>;

/** Why a part PUT failed, in words a person can act on. */
export class PartUploadError extends Error {
  /** HTTP status of the store's answer, 0 when there was none. */
  readonly status: number;
  constructor(message: string, status: number) {
    super(message);
    this.name = 'PartUploadError';
    this.status = status;
  }
}

/** The browser implementation of PutPart. */
export const putPartWithXhr: PutPart = (url, body, { signal, onProgress }) =>
  new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    const onAbort = () => xhr.abort();
    xhr.open('PUT', url);
    xhr.upload.onprogress = (e) => onProgress(e.loaded);
    xhr.onload = () => {
      signal.removeEventListener('abort', onAbort);
      const etag = xhr.getResponseHeader('ETag');
      if (xhr.status >= 200 && xhr.status < 300 && etag) return resolve(etag);
      reject(
        new PartUploadError(
          etag || xhr.status >= 300
            ? `The file store refused the part (HTTP ${xhr.status}).`
            : 'The file store accepted the part but did not say its ETag (check its CORS rules).',
          xhr.status,
        ),
      );
    };
    xhr.onerror = () => {
      signal.removeEventListener('abort', onAbort);
      reject(new PartUploadError('The file store could not be reached.', 0));
    };
    xhr.onabort = () => reject(new DOMException('The part upload was canceled.', 'AbortError'));
    if (signal.aborted)
      return reject(new DOMException('The part upload was canceled.', 'AbortError'));
    signal.addEventListener('abort', onAbort, { once: true });
    xhr.send(body);
  });
