// GET /api/shows/:showId/members: the people of a show, e.g. to choose or filter by assignees.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { isRole, type Role } from '@/features/auth/permissions';
import { apiRequest } from '@/lib/api-client';

/** A member of a show. */
export interface ShowMember {
  userId: string;
  displayName: string;
  email: string;
  role: Role;
  disabled: boolean;
  since: string;
}

/** Checks the members answer. */
export function parseShowMembers(value: unknown): ShowMember[] {
  if (!Array.isArray(value)) throw new TypeError('The members answer is not a list.');
  return value.map((m, i) => {
    const b = (m ?? {}) as Record<string, unknown>;
    if (typeof b.userId !== 'string' || typeof b.displayName !== 'string' || !isRole(b.role)) {
      throw new TypeError(`Member ${i + 1} of the answer has no id, name or known role.`);
    }
    return {
      userId: b.userId,
      displayName: b.displayName,
      email: String(b.email),
      role: b.role,
      disabled: b.disabled === true,
      since: String(b.since),
    };
  });
}

/** Fetches the members of a show. */
export function getShowMembers(
  showId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<ShowMember[]> {
  return apiRequest(`/shows/${encodeURIComponent(showId)}/members`, { signal }, parseShowMembers);
}

/** Query options for a show's members; membership changes invalidate ['shows', id, 'members']. */
export function getShowMembersQueryOptions(showId: string) {
  return queryOptions({
    queryKey: ['shows', showId, 'members'],
    queryFn: ({ signal }) => getShowMembers(showId, { signal }),
  });
}

/** The members of a show. */
export function useShowMembers(showId: string) {
  return useQuery(getShowMembersQueryOptions(showId));
}
