// Query keys of the shot screens, under the show so a show's data refreshes together.
import type { ShotListParams } from './get-shots';

/** Query keys for shots, their takes and jobs. */
export const shotKeys = {
  all: (showId: string) => ['shows', showId, 'shots'] as const,
  lists: (showId: string) => [...shotKeys.all(showId), 'list'] as const,
  list: (showId: string, params: ShotListParams) => [...shotKeys.lists(showId), params] as const,
  detail: (showId: string, id: string) => [...shotKeys.all(showId), 'detail', id] as const,
  takes: (showId: string, id: string) => [...shotKeys.all(showId), 'detail', id, 'takes'] as const,
  jointMap: (showId: string, id: string, profileId: string) =>
    [...shotKeys.all(showId), 'detail', id, 'joint-map', profileId] as const,
  jobs: (showId: string) => ['shows', showId, 'jobs'] as const,
  jobList: (showId: string, shotId: string) =>
    [...shotKeys.jobs(showId), 'list', { shotId }] as const,
  job: (showId: string, jobId: string) => [...shotKeys.jobs(showId), 'detail', jobId] as const,
  members: (showId: string) => ['shows', showId, 'members'] as const,
};

/** How often a page without the live stream polls running jobs, in milliseconds. */
export const JOB_POLL_MS = 1500;
