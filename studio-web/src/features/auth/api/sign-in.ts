// POST /api/auth/sign-in: check e-mail and password; the API sets the session cookie.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AuthMeta } from '@/lib/query-client';
import { rememberSignedIn } from '@/lib/session-hint';
import { dropOtherUsersData, ME_QUERY_KEY } from './get-me';
import { parseSessionUser, type SessionUser } from './session-user';

/** What the sign-in form sends. */
export interface SignInInput {
  email: string;
  password: string;
}

/** Signs in and returns the user. */
export function signIn(input: SignInInput): Promise<SessionUser> {
  return apiRequest('/auth/sign-in', { method: 'POST', body: input }, parseSessionUser);
}

// A wrong password answers 401: that belongs to the form, not to session expiry.
const META: AuthMeta = { expectsUnauthenticated: true };

/** Signs in; drops whatever an earlier user left in the cache and stores the new user. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    meta: META,
    onSuccess: (user) => {
      rememberSignedIn(true);
      dropOtherUsersData(queryClient);
      queryClient.setQueryData(ME_QUERY_KEY, user);
    },
  });
}
