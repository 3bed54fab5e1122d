import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { requirePermission } from '@/features/auth/session-loaders';
import { getShotSummaryQueryOptions } from './api/get-shot-summary';
import { getThroughputQueryOptions } from './api/get-throughput';
import { TrackingScreen } from './components/tracking-screen';

/** The tracking screens' routes, mounted inside the signed-in layout. */
export function trackingRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.tracking.path,
      middleware: [requirePermission(queryClient, 'track')],
      loader: ({ params }) => {
        const showId = params.showId ?? '';
        // Started, not awaited: the screen shows each part as it arrives.
        void queryClient.prefetchQuery(getShotSummaryQueryOptions(showId));
        void queryClient.prefetchQuery(getThroughputQueryOptions(showId));
        return null;
      },
      element: <TrackingScreen />,
    },
  ];
}
