// An invitation as POST /api/auth/invitations/lookup and the admin list return it.
import { isRole, type Role } from '../permissions';

/** An open invitation: who, as what, to which shows, until when. */
export interface Invitation {
  id: string;
  email: string;
  role: Role;
  shows: { id: string; code: string; name: string }[];
  createdAt: string;
  expiresAt: string;
}

/** Checks one invitation of an answer. */
export function parseInvitation(value: unknown): Invitation {
  const body = (value ?? {}) as Record<string, unknown>;
  for (const name of ['id', 'email', 'createdAt', 'expiresAt']) {
    if (typeof body[name] !== 'string') throw new TypeError(`The invitation has no "${name}".`);
  }
  if (!isRole(body.role)) throw new TypeError(`The invitation has an unknown role.`);
  const shows = Array.isArray(body.shows) ? body.shows : [];
  return {
    id: body.id as string,
    email: body.email as string,
    role: body.role,
    shows: shows.map((s) => {
      const show = s as Record<string, unknown>;
      return { id: String(show.id), code: String(show.code), name: String(show.name) };
    }),
    createdAt: body.createdAt as string,
    expiresAt: body.expiresAt as string,
  };
}
