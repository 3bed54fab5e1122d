// The app's query client and router, made together so a 401 anywhere can steer the router.
import type { QueryClient } from '@tanstack/react-query';
import type { createBrowserRouter, RouteObject } from 'react-router-dom';
import { createQueryClient } from '@/lib/query-client';
import { rememberSignedIn } from '@/lib/session-hint';
import { createAppRoutes } from './router';
import { sendToSignIn } from './session-expiry';

type DataRouter = ReturnType<typeof createBrowserRouter>;

/** The pair the app runs on. */
export interface Studio {
  queryClient: QueryClient;
  router: DataRouter;
}

/** Builds the query client and a router from `makeRouter` (browser, or memory in tests). */
export function createStudio(makeRouter: (routes: RouteObject[]) => DataRouter): Studio {
  // Filled right below: the query client comes first because the routes' loaders need it.
  const made: { router?: DataRouter } = {};
  const queryClient = createQueryClient({
    onUnauthenticated: () => {
      rememberSignedIn(false);
      if (made.router) sendToSignIn(made.router);
    },
  });
  const router = makeRouter(createAppRoutes(queryClient));
  made.router = router;
  return { queryClient, router };
}
