// POST /api/shows/:showId/shots: create a shot.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { showPath } from '@/features/library/api/library-keys';
import { parseShot, type Shot } from './shot-types';
import { shotKeys } from './shot-keys';

/** The fields of a new shot. */
export interface ShotInput {
  sequence: string;
  code: string;
  frameStart: number;
  frameEnd: number;
  fps: number;
  characterId?: string | null;
  clipId?: string | null;
  assigneeIds?: string[];
  dueDate?: string | null;
}

/** Creates a shot. */
export function createShot(showId: string, input: ShotInput): Promise<Shot> {
  return apiRequest(`${showPath(showId)}/shots`, { method: 'POST', body: input }, parseShot);
}

/** Mutation that creates a shot, seeds its page and refreshes the table. */
export function useCreateShot(showId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShotInput) => createShot(showId, input),
    onSuccess: (shot) => {
      queryClient.setQueryData(shotKeys.detail(showId, shot.id), shot);
      void queryClient.invalidateQueries({ queryKey: shotKeys.lists(showId) });
    },
  });
}
