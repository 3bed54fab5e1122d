// DELETE /api/admin/shows/:showId/tokens/:tokenId: revoke a pipeline token at once.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { getTokensQueryOptions } from './get-tokens';

/** The show and the token. */
export interface RevokeTokenInput {
  showId: string;
  tokenId: string;
}

/** Revokes the token. */
export async function revokeToken({ showId, tokenId }: RevokeTokenInput): Promise<void> {
  await apiRequest(
    `/admin/shows/${encodeURIComponent(showId)}/tokens/${encodeURIComponent(tokenId)}`,
    { method: 'DELETE' },
  );
}

/** Mutation revoking a token; refreshes the list. */
export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeToken,
    onSuccess: (_, { showId }) =>
      void queryClient.invalidateQueries({ queryKey: getTokensQueryOptions(showId).queryKey }),
  });
}
