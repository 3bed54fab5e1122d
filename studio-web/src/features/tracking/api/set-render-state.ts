// PUT /api/shows/:showId/shots/:shotId/render-state: a producer moves the render state by hand.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { RenderState } from '@/lib/shot-states';
import { parseTrackedShot, type TrackedShot } from './tracked-shot';

/** What the mutation sends. */
export interface SetRenderStateInput {
  showId: string;
  shotId: string;
  state: RenderState;
}

/** Sets a shot's render state; the API refuses moves RENDER_MOVES does not list (409). */
export function setRenderState({
  showId,
  shotId,
  state,
}: SetRenderStateInput): Promise<TrackedShot> {
  return apiRequest(
    `/shows/${encodeURIComponent(showId)}/shots/${encodeURIComponent(shotId)}/render-state`,
    { method: 'PUT', body: { state } },
    (body) => parseTrackedShot(body),
  );
}

/** Mutation that sets the render state and refreshes the show's shot table and counts. */
export function useSetRenderState() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setRenderState,
    onSuccess: (_shot, { showId }) =>
      queryClient.invalidateQueries({ queryKey: ['shows', showId, 'shots'] }),
  });
}
