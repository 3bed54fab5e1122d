import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';

/** The library screens' routes, mounted inside the signed-in layout. */
export function libraryRoutes(_queryClient: QueryClient): RouteObject[] {
  return [];
}
