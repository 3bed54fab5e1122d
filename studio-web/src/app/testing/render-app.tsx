// Renders the whole studio (routes, loaders, 401 handling) in memory at an address.
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { rememberSignedIn } from '@/lib/session-hint';
import { AppProvider } from '../provider';
import { createStudio } from '../studio';

/**
 * The rendered app and its router, to read the current address. `signedInBefore` is whether
 * this browser remembers signing in (the API, mocked, still decides).
 */
export function renderApp(path: string, { signedInBefore = true } = {}) {
  rememberSignedIn(signedInBefore);
  const studio = createStudio((routes) => createMemoryRouter(routes, { initialEntries: [path] }));
  const view = render(
    <AppProvider queryClient={studio.queryClient}>
      <RouterProvider router={studio.router} />
    </AppProvider>,
  );
  return { ...view, ...studio };
}

/** The router's current address: path, query and fragment. */
export function currentHref(router: ReturnType<typeof renderApp>['router']): string {
  const { pathname, search, hash } = router.state.location;
  return `${pathname}${search}${hash}`;
}
