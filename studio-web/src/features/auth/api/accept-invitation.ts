// POST /api/auth/invitations/accept: create the account and sign it in.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AuthMeta } from '@/lib/query-client';
import { rememberSignedIn } from '@/lib/session-hint';
import { dropOtherUsersData, ME_QUERY_KEY } from './get-me';
import { parseSessionUser, type SessionUser } from './session-user';

/** The link's token, the name the person chose and their password. */
export interface AcceptInvitationInput {
  token: string;
  displayName: string;
  password: string;
}

/** Creates the account; the API signs it in. */
export function acceptInvitation(input: AcceptInvitationInput): Promise<SessionUser> {
  return apiRequest('/auth/invitations/accept', { method: 'POST', body: input }, parseSessionUser);
}

/** Accepts the invitation and stores the new user as signed in. */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { expectsUnauthenticated: true } satisfies AuthMeta,
    onSuccess: (user) => {
      rememberSignedIn(true);
      dropOtherUsersData(queryClient);
      queryClient.setQueryData(ME_QUERY_KEY, user);
    },
  });
}
