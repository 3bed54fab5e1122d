// PATCH /api/admin/shows/:showId: rename, archive or restore a show.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { parseShow, type Show } from '@/features/shows';
import { apiRequest } from '@/lib/api-client';

/** The change: a new name and/or archived (true) or restored (false). */
export interface UpdateShowInput {
  showId: string;
  name?: string;
  archived?: boolean;
}

/** Applies the change. */
export function updateShow({ showId, ...change }: UpdateShowInput): Promise<Show> {
  return apiRequest(
    `/admin/shows/${encodeURIComponent(showId)}`,
    { method: 'PATCH', body: change },
    parseShow,
  );
}

/** Mutation changing a show; refreshes every show list. */
export function useUpdateShow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShow,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['shows'] }),
  });
}
