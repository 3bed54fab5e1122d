// GET /api/shows/:showId/jobs/:jobId: a job's state and progress, polled while it runs.
import { queryOptions, useQuery, type Query } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import { isJobFinished, parseJob, type Job as RetargetJob } from '@/features/library/api/job-view';
import { showPath, takeKeys } from './take-keys';

/** How often a running job is asked again, in milliseconds. */
export const JOB_POLL_MS = 1000;

/** Fetches one job. */
export function getJob(
  showId: string,
  jobId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<RetargetJob> {
  return apiRequest(`${showPath(showId)}/jobs/${encodeURIComponent(jobId)}`, { signal }, parseJob);
}

/** Poll until finished, or until the API says there is no such job (4xx). */
function jobRefetchInterval(query: Query<RetargetJob>): number | false {
  if (isJobFinished(query.state.data?.state)) return false;
  const error = query.state.error;
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return JOB_POLL_MS;
}

/** Query options for one job, polled while it runs when `follow` is set. */
export function getJobQueryOptions(showId: string, jobId: string, follow = false) {
  return queryOptions({
    queryKey: takeKeys.job(showId, jobId),
    queryFn: ({ signal }) => getJob(showId, jobId, { signal }),
    refetchInterval: follow ? jobRefetchInterval : false,
    staleTime: follow ? 0 : 60_000,
  });
}

/** One job; `follow` polls it until it is finished. Idle while there is no id. */
export function useJob(showId: string, jobId: string | undefined, { follow = false } = {}) {
  return useQuery({
    ...getJobQueryOptions(showId, jobId ?? '', follow),
    enabled: jobId !== undefined,
  });
}
