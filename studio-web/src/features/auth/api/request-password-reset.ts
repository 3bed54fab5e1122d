// POST /api/auth/password-reset: e-mail a reset link to an address.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** Asks for a reset link; the API answers alike for known and unknown addresses. */
export async function requestPasswordReset(input: { email: string }): Promise<string> {
  const body = await apiRequest<{ message?: unknown }>('/auth/password-reset', {
    method: 'POST',
    body: input,
  });
  return typeof body?.message === 'string' ? body.message : 'A reset link is on its way.';
}

/** Mutation asking for a reset link; resolves to the API's sentence. */
export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
