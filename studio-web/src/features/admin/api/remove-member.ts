// DELETE /api/admin/shows/:showId/members/:userId: take a user off a show.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { MemberInput } from './add-member';

/** Removes the user from the show. */
export async function removeMember({ showId, userId }: MemberInput): Promise<void> {
  await apiRequest(
    `/admin/shows/${encodeURIComponent(showId)}/members/${encodeURIComponent(userId)}`,
    { method: 'DELETE' },
  );
}

/** Mutation removing a member; refreshes the show's members and the user list. */
export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: (_, { showId }) => {
      void queryClient.invalidateQueries({ queryKey: ['shows', showId, 'members'] });
      void queryClient.invalidateQueries({ queryKey: ['admin', 'users'] });
    },
  });
}
