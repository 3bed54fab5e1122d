// A 401 from any request means the session is gone: go to sign-in, then come back here.
import { matchPath, type createBrowserRouter } from 'react-router-dom';
import { paths } from '@/config/paths';

type DataRouter = ReturnType<typeof createBrowserRouter>;

/** Pages open to anyone: a 401 there is no reason to leave. */
const PUBLIC_PAGES = [
  paths.signIn.path,
  paths.acceptInvitation.path,
  paths.resetPassword.path,
  paths.status.path,
];

/** The sign-in address that returns to the page being shown (or being opened), if any. */
export function signInHrefFor(router: Pick<DataRouter, 'state'>): string | null {
  const { navigation, location } = router.state;
  const target = navigation.location ?? location;
  if (PUBLIC_PAGES.some((path) => matchPath(path, target.pathname))) return null;
  return paths.signIn.getHref(`${target.pathname}${target.search}${target.hash}`);
}

/** Sends the router to sign-in with `redirectTo` set to the current page. */
export function sendToSignIn(router: Pick<DataRouter, 'state' | 'navigate'>): void {
  const href = signInHrefFor(router);
  if (href) void router.navigate(href, { replace: true });
}
