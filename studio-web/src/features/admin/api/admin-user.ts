// A user as the admin screens see them: the session view plus their shows.
import { isRole, type Role } from '@/features/auth/permissions';

/** A user with role, state and shows. */
export interface AdminUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  disabled: boolean;
  createdAt: string;
  showIds: string[];
}

/** Checks one user of an answer. */
export function parseAdminUser(value: unknown, where = 'The user'): AdminUser {
  const b = (value ?? {}) as Record<string, unknown>;
  for (const name of ['id', 'email', 'displayName', 'createdAt']) {
    if (typeof b[name] !== 'string') throw new TypeError(`${where} has no "${name}".`);
  }
  if (!isRole(b.role)) throw new TypeError(`${where} has an unknown role: ${String(b.role)}.`);
  return {
    id: b.id as string,
    email: b.email as string,
    displayName: b.displayName as string,
    role: b.role,
    disabled: b.disabled === true,
    createdAt: b.createdAt as string,
    showIds: Array.isArray(b.showIds) ? b.showIds.map(String) : [],
  };
}

/** Checks a list of users. */
export function parseAdminUsers(value: unknown): AdminUser[] {
  if (!Array.isArray(value)) throw new TypeError('The users answer is not a list.');
  return value.map((u, i) => parseAdminUser(u, `User ${i + 1} of the answer`));
}
