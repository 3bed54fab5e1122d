import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';

/** The takes screens' routes, mounted inside the signed-in layout. */
export function takesRoutes(_queryClient: QueryClient): RouteObject[] {
  return [];
}
