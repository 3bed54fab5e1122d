// POST /api/admin/invitations: invite an address with a role and shows (sends the e-mail).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { parseInvitation, type Invitation } from '@/features/auth/api/invitation';
import type { Role } from '@/features/auth/permissions';
import { apiRequest } from '@/lib/api-client';
import { getInvitationsQueryOptions } from './get-invitations';

/** Who to invite, as what, to which shows. */
export interface CreateInvitationInput {
  email: string;
  role: Role;
  showIds: string[];
}

/** Sends an invitation; an open one to the same address is replaced. */
export function createInvitation(input: CreateInvitationInput): Promise<Invitation> {
  return apiRequest('/admin/invitations', { method: 'POST', body: input }, parseInvitation);
}

/** Mutation sending an invitation; refreshes the open list and the outbox. */
export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions().queryKey });
      void queryClient.invalidateQueries({ queryKey: ['admin', 'outbox'] });
    },
  });
}
