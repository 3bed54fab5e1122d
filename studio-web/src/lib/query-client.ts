// Shared TanStack Query defaults for the studio.
import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** Retry up to twice, but never when the API said the request itself was wrong (4xx). */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** A query client with the studio's defaults; one per app (or per test). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 5_000 },
      mutations: { retry: false },
    },
  });
}
