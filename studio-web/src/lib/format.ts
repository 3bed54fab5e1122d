// Display formats for numbers and times shown in the mono face.

/** A latency with its unit: "4.2 ms", "< 0.1 ms", "1.25 s"; "not measured" when absent. */
export function formatLatency(ms: number | undefined): string {
  if (ms === undefined || !Number.isFinite(ms) || ms < 0) return 'not measured';
  if (ms < 0.1) return '< 0.1 ms';
  if (ms < 1000) return `${ms.toFixed(1)} ms`;
  return `${(ms / 1000).toFixed(2)} s`;
}

const CLOCK = new Intl.DateTimeFormat(undefined, {
  hour: '2-digit',
  minute: '2-digit',
  second: '2-digit',
  hour12: false,
});

/** Local wall-clock time of an ISO timestamp ("14:03:27"); "unknown time" if unreadable. */
export function formatClockTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? 'unknown time' : CLOCK.format(date);
}
