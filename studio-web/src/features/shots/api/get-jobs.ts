// GET /api/shows/:showId/jobs?shotId=: a shot's retarget jobs, newest first.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { isJobFinished, parseJob, type Job } from '@/features/library/api/job-view';
import { showPath } from '@/features/library/api/library-keys';
import { asArray, asObject } from '@/lib/parse-answer';
import { JOB_POLL_MS, shotKeys } from './shot-keys';

/** Fetches a shot's jobs. */
export function getShotJobs(
  showId: string,
  shotId: string,
  { signal }: { signal?: AbortSignal } = {},
) {
  return apiRequest(
    `${showPath(showId)}/jobs?shotId=${encodeURIComponent(shotId)}&kind=retarget`,
    { signal },
    (v) => asArray(asObject(v, 'job list').items, 'job list').map(parseJob),
  );
}

/** Query options for a shot's jobs; polls while one runs if `poll`. */
export function getShotJobsQueryOptions(showId: string, shotId: string, poll = false) {
  return queryOptions({
    queryKey: shotKeys.jobList(showId, shotId),
    queryFn: ({ signal }) => getShotJobs(showId, shotId, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.some((j: Job) => !isJobFinished(j.state)) ? JOB_POLL_MS : false,
  });
}

/** A shot's jobs. */
export function useShotJobs(showId: string, shotId: string, { poll = false } = {}) {
  return useQuery(getShotJobsQueryOptions(showId, shotId, poll));
}
