// The signed-in user as GET /api/auth/me (and sign-in, invitation acceptance) return them.
import { isRole, type Role } from '../permissions';

/** The person using the studio. */
export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  disabled: boolean;
  createdAt: string;
}

function field(body: Record<string, unknown>, name: string): string {
  const value = body[name];
  if (typeof value !== 'string') throw new TypeError(`The user answer has no "${name}".`);
  return value;
}

/** Checks a `{ kind: 'user', user }` answer and returns its user. */
export function parseSessionUser(body: unknown): SessionUser {
  const me = (body ?? {}) as Record<string, unknown>;
  if (me.kind !== 'user') {
    throw new TypeError('The answer is not a signed-in person (a pipeline token cannot sign in).');
  }
  const user = (me.user ?? {}) as Record<string, unknown>;
  const role = user.role;
  if (!isRole(role)) throw new TypeError(`The user answer has an unknown role: ${String(role)}.`);
  return {
    id: field(user, 'id'),
    email: field(user, 'email'),
    displayName: field(user, 'displayName'),
    role,
    disabled: user.disabled === true,
    createdAt: field(user, 'createdAt'),
  };
}
