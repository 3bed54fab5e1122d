// Route loaders of the shows feature.
import type { QueryClient } from '@tanstack/react-query';
import { getShowsQueryOptions } from './api/get-shows';

/** Starts loading the caller's shows as the page opens (the page shows its own wait). */
export function showsLoader(queryClient: QueryClient) {
  return () => {
    void queryClient.prefetchQuery(getShowsQueryOptions());
    return null;
  };
}
