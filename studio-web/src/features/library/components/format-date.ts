// Dates as the library and shot tables show them.

const DAY = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

/** A calendar date for an ISO time or YYYY-MM-DD ("3 Mar 2030"); "—" when absent or unreadable. */
export function formatDay(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(/^\d{4}-\d{2}-\d{2}$/.test(iso) ? `${iso}T12:00:00Z` : iso);
  return Number.isNaN(date.getTime()) ? '—' : DAY.format(date);
}
