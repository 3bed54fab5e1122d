// GET /api/admin/users: every user with role, state and shows.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseAdminUsers, type AdminUser } from './admin-user';

/** Fetches every user. */
export function getUsers({ signal }: { signal?: AbortSignal } = {}): Promise<AdminUser[]> {
  return apiRequest('/admin/users', { signal }, parseAdminUsers);
}

/** Query options for the user list. */
export function getUsersQueryOptions() {
  return queryOptions({
    queryKey: ['admin', 'users'],
    queryFn: ({ signal }) => getUsers({ signal }),
  });
}

/** Every user. */
export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
