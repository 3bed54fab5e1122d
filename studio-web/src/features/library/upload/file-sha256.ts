// SHA-256 of a file, declared at upload and verified by the server's check.

/** Hex SHA-256 of the file's bytes, by the browser's Web Crypto. */
export async function fileSha256(file: Blob): Promise<string> {
  // Web Crypto has no incremental digest, so the file is read whole: fine for characters and
  // clips; the largest captures need that much memory for a moment.
  const digest = await crypto.subtle.digest('SHA-256', await file.arrayBuffer());
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}
