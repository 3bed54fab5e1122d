// POST /api/shows/:showId/takes/:takeId/decisions: a supervisor approves a take or requests
// changes; the API e-mails the people concerned.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseDecision, type Decision, type ReviewDecision } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** The decision and an optional comment. */
export interface CreateDecisionInput {
  showId: string;
  takeId: string;
  decision: Decision;
  comment?: string;
}

/** Records a decision. */
export function createDecision({
  showId,
  takeId,
  ...body
}: CreateDecisionInput): Promise<ReviewDecision> {
  return apiRequest(
    `${showPath(showId)}/takes/${encodeURIComponent(takeId)}/decisions`,
    { method: 'POST', body },
    parseDecision,
  );
}

/** Mutation that records a decision and refreshes the take (its review state) and decisions. */
export function useCreateDecision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDecision,
    onSuccess: (_decision, { showId, takeId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: takeKeys.decisions(showId, takeId) }),
        queryClient.invalidateQueries({ queryKey: takeKeys.take(showId, takeId), exact: true }),
      ]),
  });
}
