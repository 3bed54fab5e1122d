// POST /api/auth/password-reset/confirm: set a new password with the e-mailed link's token.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AuthMeta } from '@/lib/query-client';

/** The link's token and the new password. */
export interface ConfirmPasswordResetInput {
  token: string;
  password: string;
}

/** Sets the new password; every session of the account ends. */
export async function confirmPasswordReset(input: ConfirmPasswordResetInput): Promise<void> {
  await apiRequest('/auth/password-reset/confirm', { method: 'POST', body: input });
}

/** Mutation setting the new password. */
export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: confirmPasswordReset,
    meta: { expectsUnauthenticated: true } satisfies AuthMeta,
  });
}
