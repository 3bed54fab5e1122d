// POST /api/admin/shows/:showId/tokens: create a pipeline token (its secret is shown once).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getTokensQueryOptions } from './get-tokens';
import { parseCreatedToken, type CreatedToken, type TokenScope } from './pipeline-token';

/** The show, the token's name and what it may do. */
export interface CreateTokenInput {
  showId: string;
  name: string;
  scopes: TokenScope[];
}

/** Creates a token and returns it with its secret. */
export function createToken({ showId, ...body }: CreateTokenInput): Promise<CreatedToken> {
  return apiRequest(
    `/admin/shows/${encodeURIComponent(showId)}/tokens`,
    { method: 'POST', body },
    parseCreatedToken,
  );
}

/** Mutation creating a token; the list refreshes without the secret. */
export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createToken,
    onSuccess: (_, { showId }) =>
      void queryClient.invalidateQueries({ queryKey: getTokensQueryOptions(showId).queryKey }),
  });
}
