// POST /api/auth/sign-out: end this session; the API clears the cookie.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AuthMeta } from '@/lib/query-client';
import { rememberSignedIn } from '@/lib/session-hint';

/** Ends the current session; this browser counts as signed out whatever the answer. */
export async function signOut(): Promise<void> {
  rememberSignedIn(false);
  await apiRequest('/auth/sign-out', { method: 'POST' });
}

// Signing out of a session that already expired is still signing out.
const META: AuthMeta = { expectsUnauthenticated: true };

/** Mutation that ends the session; the caller leaves the page and clears the cache. */
export function useSignOut() {
  return useMutation({ mutationFn: signOut, meta: META });
}
