// POST /api/auth/invitations/lookup: what an invitation link offers.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseInvitation, type Invitation } from './invitation';

/** Reads the invitation behind a link token. */
export function lookupInvitation(
  token: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<Invitation> {
  return apiRequest(
    '/auth/invitations/lookup',
    { method: 'POST', body: { token }, signal },
    parseInvitation,
  );
}

/** Query options for one invitation link; a bad link answers 400 LINK_INVALID. */
export function lookupInvitationQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['auth', 'invitation', token],
    queryFn: ({ signal }) => lookupInvitation(token, { signal }),
    retry: false,
    staleTime: Infinity,
  });
}

/** The invitation behind the link; idle without a token. */
export function useInvitation(token: string | undefined) {
  return useQuery({ ...lookupInvitationQueryOptions(token ?? ''), enabled: Boolean(token) });
}
