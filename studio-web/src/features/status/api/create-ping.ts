// POST /api/diagnostics/pings: send a test job through the queue to a worker.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getPingQueryOptions } from './get-ping';
import { parsePingJob, type PingJob } from './ping-job';

/** What the test job asks the worker to do: how many progress steps to report. */
export interface CreatePingInput {
  steps: number;
}

/** Queues a test job and returns it in its first state. */
export function createPing(input: CreatePingInput): Promise<PingJob> {
  return apiRequest('/diagnostics/pings', { method: 'POST', body: input }, parsePingJob);
}

/** Mutation that queues a test job and seeds its cache entry so polling starts from it. */
export function useCreatePing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPing,
    onSuccess: (job) => {
      queryClient.setQueryData(getPingQueryOptions(job.id).queryKey, job);
    },
  });
}
