// Route middleware and loaders that decide who may enter a page: signed-in users, a role, or
// the signed-out.
import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs, type MiddlewareFunction } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isUnauthenticated } from '@/lib/query-client';
import { safeRedirect } from '@/lib/safe-redirect';
import { getMeQueryOptions } from './api/get-me';
import type { SessionUser } from './api/session-user';
import { can, type Action } from './permissions';

/** Where a signed-in user lands when nothing else was asked for. */
export const HOME_AFTER_SIGN_IN = paths.shows.getHref();

function here(request: Request): string {
  const url = new URL(request.url);
  return `${url.pathname}${url.search}${url.hash}`;
}

/** The signed-in user, or a redirect to sign-in that comes back to this address. */
async function userOrSignIn(queryClient: QueryClient, request: Request): Promise<SessionUser> {
  try {
    return await queryClient.ensureQueryData(getMeQueryOptions());
  } catch (error) {
    if (isUnauthenticated(error)) throw redirect(paths.signIn.getHref(here(request)));
    throw error;
  }
}

/**
 * Middleware of the signed-in area: fetches the user once, or sends the browser to sign-in.
 * Middleware runs before every loader below it, so no page asks the API for its data (and
 * meets a 401) before the session is known.
 */
export function requireSession(queryClient: QueryClient): MiddlewareFunction {
  return async ({ request }) => {
    await userOrSignIn(queryClient, request);
  };
}

const FORBIDDEN: Partial<Record<Action, string>> = {
  admin: 'Only admins may open the admin screens.',
  track: 'Tracking is for producers and admins.',
};

/**
 * Middleware of pages for roles that may do `action`: others get a 403 page, the signed-out
 * sign-in. Runs before the pages' loaders, so a refused role never fetches their data.
 */
export function requirePermission(queryClient: QueryClient, action: Action): MiddlewareFunction {
  return async ({ request }) => {
    const user = await userOrSignIn(queryClient, request);
    if (!can(user.role, action)) {
      throw new Response(FORBIDDEN[action] ?? 'Your role may not open this page.', {
        status: 403,
        statusText: 'Forbidden',
      });
    }
  };
}

/** Asks the API afresh (never the cache) whether someone is signed in. */
export async function currentUser(queryClient: QueryClient): Promise<SessionUser | null> {
  try {
    return await queryClient.fetchQuery({ ...getMeQueryOptions(), staleTime: 0 });
  } catch (error) {
    // The query keeps its last user next to the error: pages still on screen during the
    // navigation keep rendering; the header reads the error as "signed out".
    if (isUnauthenticated(error)) return null;
    throw error;
  }
}

/** Loader of the sign-in page: someone already signed in goes on to where they were going. */
export function redirectIfSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await currentUser(queryClient).catch(() => null);
    if (user) {
      const target = new URL(request.url).searchParams.get('redirectTo');
      throw redirect(safeRedirect(target, HOME_AFTER_SIGN_IN));
    }
    return null;
  };
}

/** Loader of `/`: your shows when signed in, else the public Status page. */
export function homeRedirect(queryClient: QueryClient) {
  return async () => {
    // Unreachable API or no session: Status says which services are up and offers sign-in.
    const user = await currentUser(queryClient).catch(() => null);
    throw redirect(user ? HOME_AFTER_SIGN_IN : paths.status.getHref());
  };
}
