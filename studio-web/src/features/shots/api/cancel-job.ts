// POST /api/shows/:showId/jobs/:jobId/cancel: stop a queued or running job.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseJob, type Job } from '@/features/library/api/job-view';
import { showPath } from '@/features/library/api/library-keys';
import { shotKeys } from './shot-keys';

/** Cancels a job; answers with it in its canceled state. */
export function cancelJob(showId: string, jobId: string): Promise<Job> {
  return apiRequest(
    `${showPath(showId)}/jobs/${encodeURIComponent(jobId)}/cancel`,
    { method: 'POST' },
    parseJob,
  );
}

/** Mutation that cancels a job and refreshes the shot's jobs and state. */
export function useCancelJob(showId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jobId: string) => cancelJob(showId, jobId),
    onSuccess: (job) => {
      queryClient.setQueryData(shotKeys.job(showId, job.id), job);
      void queryClient.invalidateQueries({ queryKey: shotKeys.jobs(showId) });
      void queryClient.invalidateQueries({ queryKey: shotKeys.all(showId) });
    },
  });
}
