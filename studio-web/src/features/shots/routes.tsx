import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';

/** The shots screens' routes, mounted inside the signed-in layout. */
export function shotsRoutes(_queryClient: QueryClient): RouteObject[] {
  return [];
}
