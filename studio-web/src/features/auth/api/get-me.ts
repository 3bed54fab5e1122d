// GET /api/auth/me: who is signed in.
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import { isUnauthenticated, type AuthMeta } from '@/lib/query-client';
import { mayBeSignedIn, rememberSignedIn } from '@/lib/session-hint';
import { parseSessionUser, type SessionUser } from './session-user';

/** Cache key of the signed-in user; sign-in and sign-out write it. */
export const ME_QUERY_KEY = ['auth', 'me'] as const;

/** Fetches the signed-in user; rejects with a 401 ApiError when nobody is signed in. */
export async function getMe({ signal }: { signal?: AbortSignal } = {}): Promise<SessionUser> {
  if (!mayBeSignedIn()) {
    // Signed out on this browser: answer as the API would, without asking it.
    throw new ApiError({
      status: 401,
      code: 'NOT_SIGNED_IN',
      message: 'Nobody is signed in on this browser.',
    });
  }
  try {
    return await apiRequest('/auth/me', { signal }, parseSessionUser);
  } catch (error) {
    if (isUnauthenticated(error)) rememberSignedIn(false);
    throw error;
  }
}

// Asking "who am I" while signed out is a question, not an expired session: the route loaders
// decide where to go, so this query's 401 never triggers the sign-in redirect by itself.
const META: AuthMeta = { expectsUnauthenticated: true };

/** Query options for the signed-in user. Any 401 from another request ends the session. */
export function getMeQueryOptions() {
  return queryOptions({
    queryKey: ME_QUERY_KEY,
    queryFn: ({ signal }) => getMe({ signal }),
    staleTime: 5 * 60_000,
    meta: META,
  });
}

/** The signed-in user as a plain query (pending, error or data): for pages open to anyone. */
export function useMe() {
  return useQuery(getMeQueryOptions());
}

/**
 * Forgets every cached answer but the auth ones (the page on screen may be reading those):
 * whoever signs in next must not see what an earlier session fetched.
 */
export function dropOtherUsersData(queryClient: QueryClient): void {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== ME_QUERY_KEY[0] });
}
