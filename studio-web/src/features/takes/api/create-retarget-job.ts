// POST /api/shows/:showId/shots/:shotId/jobs: "save as new take" — a retarget job with the
// tuned controls, based on the take that was tuned.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getJobQueryOptions } from './get-job';
import { parseJob, type Job as RetargetJob } from '@/features/library/api/job-view';
import { showPath } from './take-keys';

/** What the job is asked to do. */
export interface CreateRetargetJobInput {
  showId: string;
  shotId: string;
  profileId: string;
  /** Solver controls; fields left out take the solver's defaults. */
  controls: Record<string, unknown>;
  /** The take whose controls were tuned. */
  baseTakeId: string;
}

/** Submits a retarget job and returns it in its first state. */
export function createRetargetJob({
  showId,
  shotId,
  ...body
}: CreateRetargetJobInput): Promise<RetargetJob> {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}/jobs`,
    { method: 'POST', body },
    parseJob,
  );
}

/** Mutation that submits the job and seeds its cache entry so following it starts at once. */
export function useCreateRetargetJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRetargetJob,
    onSuccess: (job, input) => {
      queryClient.setQueryData(getJobQueryOptions(input.showId, job.id, true).queryKey, job);
    },
  });
}
