import type { Principal } from './principal';
import { userView, type UserView } from '../users/user-view';

/** Who the caller is: a person (with their user view) or a pipeline token. */
export type MeView =
  | { kind: 'user'; user: UserView }
  | { kind: 'token'; token: { id: string; name: string; showId: string; scopes: string[] } };

/** The view of a principal. */
export function meView(p: Principal): MeView {
  if (p.kind === 'user') return { kind: 'user', user: userView(p.user) };
  return {
    kind: 'token',
    token: { id: p.token.id, name: p.token.name, showId: p.showId, scopes: p.scopes },
  };
}
