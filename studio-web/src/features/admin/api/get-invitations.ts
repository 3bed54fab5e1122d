// GET /api/admin/invitations: invitations not yet accepted or expired.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { parseInvitation, type Invitation } from '@/features/auth/api/invitation';
import { apiRequest } from '@/lib/api-client';

/** Checks the list answer. */
export function parseInvitations(value: unknown): Invitation[] {
  if (!Array.isArray(value)) throw new TypeError('The invitations answer is not a list.');
  return value.map(parseInvitation);
}

/** Fetches the open invitations. */
export function getInvitations({ signal }: { signal?: AbortSignal } = {}): Promise<Invitation[]> {
  return apiRequest('/admin/invitations', { signal }, parseInvitations);
}

/** Query options for the open invitations. */
export function getInvitationsQueryOptions() {
  return queryOptions({
    queryKey: ['admin', 'invitations'],
    queryFn: ({ signal }) => getInvitations({ signal }),
  });
}

/** The open invitations. */
export function useInvitations() {
  return useQuery(getInvitationsQueryOptions());
}
