// GET /api/shows/:showId/shots/throughput: takes approved per ISO week.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** Takes approved in one ISO week. */
export interface WeekThroughput {
  /** `YYYY-Www`. */
  week: string;
  /** The week's Monday, `YYYY-MM-DD`. */
  start: string;
  approved: number;
}

/** Weeks the chart shows, this week last. */
export const THROUGHPUT_WEEKS = 12;

/** Checks the answer: a list of weeks. */
export function parseThroughput(value: unknown): WeekThroughput[] {
  if (!Array.isArray(value)) throw new TypeError('The throughput answer is not a list.');
  return value.map((w, i) => {
    const week = (w ?? {}) as Record<string, unknown>;
    if (typeof week.week !== 'string' || typeof week.approved !== 'number') {
      throw new TypeError(`Week ${i + 1} of the throughput answer has no week or count.`);
    }
    return { week: week.week, start: String(week.start), approved: week.approved };
  });
}

/** Fetches the approvals per week. */
export function getThroughput(
  showId: string,
  weeks: number,
  { signal }: { signal?: AbortSignal } = {},
): Promise<WeekThroughput[]> {
  const path = `/shows/${encodeURIComponent(showId)}/shots/throughput?weeks=${weeks}`;
  return apiRequest(path, { signal }, parseThroughput);
}

/** Query options for the throughput chart. */
export function getThroughputQueryOptions(showId: string, weeks = THROUGHPUT_WEEKS) {
  return queryOptions({
    queryKey: ['shows', showId, 'shots', 'throughput', weeks],
    queryFn: ({ signal }) => getThroughput(showId, weeks, { signal }),
  });
}

/** Approvals per week over the last THROUGHPUT_WEEKS weeks. */
export function useThroughput(showId: string) {
  return useQuery(getThroughputQueryOptions(showId));
}
