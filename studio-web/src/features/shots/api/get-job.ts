// GET /api/shows/:showId/jobs/:jobId: where a job is now (the polling fallback of the stream).
import { queryOptions, useQuery, type Query } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import { isJobFinished, parseJob, type Job } from '@/features/library/api/job-view';
import { showPath } from '@/features/library/api/library-keys';
import { JOB_POLL_MS, shotKeys } from './shot-keys';

/** Fetches one job. */
export function getJob(showId: string, jobId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/jobs/${encodeURIComponent(jobId)}`, { signal }, parseJob);
}

function interval(poll: boolean) {
  return (query: Query<Job>) => {
    if (!poll || isJobFinished(query.state.data?.state)) return false;
    const error = query.state.error;
    if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
    return JOB_POLL_MS;
  };
}

/** Query options for one job; polled until it finishes when `poll` (the stream is not open). */
export function getJobQueryOptions(showId: string, jobId: string, poll = false) {
  return queryOptions({
    queryKey: shotKeys.job(showId, jobId),
    queryFn: ({ signal }) => getJob(showId, jobId, { signal }),
    refetchInterval: interval(poll),
    staleTime: 0,
  });
}

/** One job, live: events update it while the stream is open, polling while it is not. */
export function useJob(showId: string, jobId: string, { poll = false } = {}) {
  return useQuery(getJobQueryOptions(showId, jobId, poll));
}
