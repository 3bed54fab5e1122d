import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';

/** The admin screens' routes, mounted inside the signed-in layout. */
export function adminRoutes(_queryClient: QueryClient): RouteObject[] {
  return [];
}
