import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import type { LayoutHandle } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';
import { getTakeQueryOptions } from './api/get-take';

/** The takes screens' routes, mounted inside the signed-in layout. */
export function takesRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.take.path,
      // The viewport takes the window's width, not the reading column's.
      handle: { wide: true } satisfies LayoutHandle,
      loader: ({ params }) => {
        // Not awaited: the page shows its own loading and error states.
        if (params.showId && params.takeId) {
          void queryClient.prefetchQuery(getTakeQueryOptions(params.showId, params.takeId));
        }
        return null;
      },
      // The player writes `?frame=` as it moves; only a new take needs the loader again.
      shouldRevalidate: ({ currentUrl, nextUrl }) => currentUrl.pathname !== nextUrl.pathname,
      // three.js and the solver load with this page only.
      lazy: async () => ({ Component: (await import('./components/take-page')).TakePage }),
    },
  ];
}
