// POST /api/shows/:showId/shots/:shotId/jobs: submit a retarget job with the artist's controls.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Controls } from '@overshoot/solver';
import { apiRequest } from '@/lib/api-client';
import { parseJob, type Job } from '@/features/library/api/job-view';
import { showPath } from '@/features/library/api/library-keys';
import { shotKeys } from './shot-keys';

/** What a retarget job needs: the profile, the controls that differ from the defaults, a joint map. */
export interface RetargetInput {
  profileId: string;
  controls?: Partial<Controls>;
  jointMap?: Record<string, string>;
}

/** Queues a retarget job; answers with the job in its queued state. */
export function createRetargetJob(
  showId: string,
  shotId: string,
  input: RetargetInput,
): Promise<Job> {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}/jobs`,
    { method: 'POST', body: input },
    parseJob,
  );
}

/** Mutation that queues a retarget job, seeds its cache entry and refreshes the shot. */
export function useCreateRetargetJob(showId: string, shotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RetargetInput) => createRetargetJob(showId, shotId, input),
    onSuccess: (job) => {
      queryClient.setQueryData(shotKeys.job(showId, job.id), job);
      void queryClient.invalidateQueries({ queryKey: shotKeys.jobList(showId, shotId) });
      void queryClient.invalidateQueries({ queryKey: shotKeys.detail(showId, shotId) });
      void queryClient.invalidateQueries({ queryKey: shotKeys.lists(showId) });
    },
  });
}
