// PATCH /api/shows/:showId/shots/:shotId: change some fields of a shot.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import type { ShotInput } from './create-shot';
import { parseShot, type Shot } from './shot-types';
import { shotKeys } from './shot-keys';

/** Changes a shot; `null` clears character, clip or due date. */
export function updateShot(
  showId: string,
  shotId: string,
  change: Partial<ShotInput>,
): Promise<Shot> {
  return apiRequest(
    `${showPath(showId)}/shots/${encodeURIComponent(shotId)}`,
    { method: 'PATCH', body: change },
    parseShot,
  );
}

/** Mutation that edits a shot and refreshes it and the table. */
export function useUpdateShot(showId: string, shotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: Partial<ShotInput>) => updateShot(showId, shotId, change),
    onSuccess: (shot) => {
      queryClient.setQueryData(shotKeys.detail(showId, shot.id), shot);
      void queryClient.invalidateQueries({ queryKey: shotKeys.lists(showId) });
    },
  });
}
