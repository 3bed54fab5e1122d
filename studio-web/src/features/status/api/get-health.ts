// GET /api/health: live state of the services behind the API.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseHealthReport, type HealthReport } from './health-report';

/** How often the status page asks again, in milliseconds. */
export const HEALTH_REFRESH_MS = 2000;

/** Fetches the health report; a 503 is a valid answer (some service is down), not a failure. */
export function getHealth({ signal }: { signal?: AbortSignal } = {}): Promise<HealthReport> {
  return apiRequest('/health', { signal, acceptStatus: [503] }, parseHealthReport);
}

/** Query options for the live health report: polled, and never retried in between polls. */
export function getHealthQueryOptions() {
  return queryOptions({
    queryKey: ['health'],
    queryFn: ({ signal }) => getHealth({ signal }),
    refetchInterval: HEALTH_REFRESH_MS,
    // The next poll is the retry; backing off here would hide an outage for seconds.
    retry: false,
    staleTime: 0,
  });
}

/** The live health report, refreshed every HEALTH_REFRESH_MS even while the API is down. */
export function useHealth() {
  return useQuery(getHealthQueryOptions());
}
