// PATCH /api/admin/users/:userId: change a role, or disable / enable an account.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@/features/auth/permissions';
import { apiRequest } from '@/lib/api-client';
import { parseAdminUser, type AdminUser } from './admin-user';
import { getUsersQueryOptions } from './get-users';

/** The change: a new role and/or disabled (true) or enabled (false). */
export interface UpdateUserInput {
  userId: string;
  role?: Role;
  disabled?: boolean;
}

/** Applies the change; disabling ends the user's sessions. */
export function updateUser({ userId, ...change }: UpdateUserInput): Promise<AdminUser> {
  return apiRequest(
    `/admin/users/${encodeURIComponent(userId)}`,
    { method: 'PATCH', body: change },
    parseAdminUser,
  );
}

/** Mutation changing a user; refreshes the list and show members (roles show there). */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey });
      void queryClient.invalidateQueries({ queryKey: ['shows'] });
    },
  });
}
