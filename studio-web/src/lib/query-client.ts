// Shared TanStack Query defaults for the studio.
import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** Retry up to twice, but never when the API said the request itself was wrong (4xx). */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** True when the API said the caller is not signed in (no session, or it expired). */
export function isUnauthenticated(error: unknown): boolean {
  return error instanceof ApiError && error.status === 401;
}

/**
 * Set `meta: { expectsUnauthenticated: true }` on a query or mutation whose 401 is an answer
 * for its own form (wrong password, say), not a sign that the session ended.
 */
export interface AuthMeta extends Record<string, unknown> {
  expectsUnauthenticated?: boolean;
}

/** Options of the studio's query client. */
export interface QueryClientOptions {
  /** Called when any query or mutation fails with 401, unless it expects one. */
  onUnauthenticated?: (error: ApiError) => void;
}

/** A query client with the studio's defaults; one per app (or per test). */
export function createQueryClient({ onUnauthenticated }: QueryClientOptions = {}): QueryClient {
  const report = (error: unknown, meta: AuthMeta | undefined) => {
    if (onUnauthenticated && isUnauthenticated(error) && !meta?.expectsUnauthenticated) {
      onUnauthenticated(error as ApiError);
    }
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => report(error, query.meta) }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => report(error, mutation.meta),
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 5_000 },
      mutations: { retry: false },
    },
  });
}
