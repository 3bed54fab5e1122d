// POST /api/admin/shows/:showId/members: add a user to a show.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** The show and the user to add. */
export interface MemberInput {
  showId: string;
  userId: string;
}

/** Adds the user to the show. */
export async function addMember({ showId, userId }: MemberInput): Promise<void> {
  await apiRequest(`/admin/shows/${encodeURIComponent(showId)}/members`, {
    method: 'POST',
    body: { userId },
  });
}

/** Mutation adding a member; refreshes the show's members and the user list. */
export function useAddMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addMember,
    onSuccess: (_, { showId }) => {
      void queryClient.invalidateQueries({ queryKey: ['shows', showId, 'members'] });
      void queryClient.invalidateQueries({ queryKey: ['admin', 'users'] });
    },
  });
}
