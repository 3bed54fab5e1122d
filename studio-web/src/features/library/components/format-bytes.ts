// File sizes in the units people read: "812 KB", "12.4 MB".

const UNITS = ['bytes', 'KB', 'MB', 'GB', 'TB'];

/** A byte count with a decimal unit (1 KB = 1000 bytes), one decimal above the kilobyte. */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return 'unknown size';
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < UNITS.length - 1) {
    value /= 1000;
    unit += 1;
  }
  return unit === 0 ? `${value} bytes` : `${value.toFixed(value < 10 ? 1 : 0)} ${UNITS[unit]}`;
}
