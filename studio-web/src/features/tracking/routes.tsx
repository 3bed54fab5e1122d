import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';

/** The tracking screens' routes, mounted inside the signed-in layout. */
export function trackingRoutes(_queryClient: QueryClient): RouteObject[] {
  return [];
}
