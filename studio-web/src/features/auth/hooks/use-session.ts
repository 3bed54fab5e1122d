import { useSuspenseQuery } from '@tanstack/react-query';
import { getMeQueryOptions } from '../api/get-me';
import type { SessionUser } from '../api/session-user';
import type { Role } from '../permissions';

/** The signed-in user and their role. */
export interface Session {
  user: SessionUser;
  role: Role;
}

/**
 * The signed-in user (GET /api/auth/me), role included. For pages inside the signed-in area:
 * its loader has already fetched the user, so this never waits; a 401 sends the browser to
 * sign-in. On pages open to anyone use `useMe()` instead.
 */
export function useSession(): Session {
  const { data } = useSuspenseQuery(getMeQueryOptions());
  return { user: data, role: data.role };
}
