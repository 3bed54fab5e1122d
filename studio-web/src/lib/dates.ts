// Calendar dates as the API writes them (`YYYY-MM-DD`, UTC).

const DAY_MS = 86_400_000;

/** Today's date in UTC, `YYYY-MM-DD`, the calendar the API judges lateness by. */
export function todayUtc(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** Whole days from `from` to `to` (both `YYYY-MM-DD`); negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(to) - Date.parse(from)) / DAY_MS);
}

/** `n day(s)`. */
export function dayCount(n: number): string {
  return `${n} day${n === 1 ? '' : 's'}`;
}
