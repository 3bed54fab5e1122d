// PATCH /api/shows/:showId/shots/:shotId with the fields a producer plans: due date, assignees.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseTrackedShot, type TrackedShot } from './tracked-shot';

/** A producer's change to a shot; a field left out stays as it is, `dueDate: null` clears it. */
export interface ShotPlanChange {
  dueDate?: string | null;
  assigneeIds?: string[];
}

/** What the mutation sends. */
export interface UpdateShotPlanInput {
  showId: string;
  shotId: string;
  change: ShotPlanChange;
}

/** Sets a shot's due date and assignees; answers with the shot as the table shows it. */
export function updateShotPlan({
  showId,
  shotId,
  change,
}: UpdateShotPlanInput): Promise<TrackedShot> {
  return apiRequest(
    `/shows/${encodeURIComponent(showId)}/shots/${encodeURIComponent(shotId)}`,
    { method: 'PATCH', body: change },
    (body) => parseTrackedShot(body),
  );
}

/** Mutation that plans a shot and refreshes the show's shot table, counts and charts. */
export function useUpdateShotPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShotPlan,
    onSuccess: (_shot, { showId }) =>
      queryClient.invalidateQueries({ queryKey: ['shows', showId, 'shots'] }),
  });
}
