// Hands a downloaded file to the browser's own "save" flow.

/** Saves `blob` under `filename` through a temporary link. */
export function saveFile(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  // Revoked on the next turn: the click has started the download by then.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
