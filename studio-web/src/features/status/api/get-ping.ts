// GET /api/diagnostics/pings/:id: where a test job is now.
import { queryOptions, useQuery, type Query } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import { isPingFinished, parsePingJob, type PingJob } from './ping-job';

/** How often a running test job is polled, in milliseconds. */
export const PING_POLL_MS = 500;

/** Fetches one test job by id. */
export function getPing(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<PingJob> {
  return apiRequest(`/diagnostics/pings/${encodeURIComponent(id)}`, { signal }, parsePingJob);
}

/** Poll until the job is finished, or the API says the job does not exist (4xx). */
function pingRefetchInterval(query: Query<PingJob>): number | false {
  if (isPingFinished(query.state.data?.state)) return false;
  const error = query.state.error;
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return PING_POLL_MS;
}

/** Query options for one test job, polled while it runs. */
export function getPingQueryOptions(id: string) {
  return queryOptions({
    queryKey: ['diagnostics', 'pings', id],
    queryFn: ({ signal }) => getPing(id, { signal }),
    refetchInterval: pingRefetchInterval,
    retry: false,
    staleTime: 0,
  });
}

/** The test job with this id, polled until it is finished; idle while there is no id. */
export function usePing(id: string | undefined) {
  return useQuery({ ...getPingQueryOptions(id ?? ''), enabled: id !== undefined });
}
