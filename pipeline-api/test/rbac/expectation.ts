// What each caller should get from each route, from a table row: the product's access rules.
import { Role } from '../../src/users/entities/role';
import type { RouteRow } from './route-table';
import type { Caller } from './callers';

/** Let through (any answer but a denial), or denied with this status. */
export type Outcome = 'allowed' | 401 | 403 | 404;

/** The outcome product.md asks for. */
export function expectedOutcome(row: RouteRow, caller: Caller): Outcome {
  if (row.roles === 'public') return 'allowed';
  if (caller.kind === 'anonymous') return 401;
  // A show the caller cannot see does not exist for them, whatever the route.
  const showRoute = row.route.includes('/:showId');
  if (caller.kind === 'user') {
    if (showRoute && caller.role !== Role.Admin && !caller.member) return 404;
    return caller.role === Role.Admin || row.roles.includes(caller.role) ? 'allowed' : 403;
  }
  if (showRoute && !caller.ownShow) return 404;
  if (!row.token) return 403;
  return row.token === 'any' || caller.scopes.includes(row.token) ? 'allowed' : 403;
}

const DENIAL_CODES: Record<401 | 403 | 404, string[]> = {
  401: ['NOT_SIGNED_IN', 'TOKEN_INVALID'],
  403: ['ROLE_NOT_ALLOWED', 'TOKEN_NOT_ALLOWED', 'TOKEN_SCOPE_MISSING', 'NO_ACCESS_RULE'],
  404: ['SHOW_NOT_FOUND'],
};

/** The outcome an answer shows: a denial by the access rules, or let through. */
export function actualOutcome(status: number, body: { code?: string }): Outcome | 'server error' {
  if (status >= 500) return 'server error';
  for (const denial of [401, 403, 404] as const) {
    if (status === denial && DENIAL_CODES[denial].includes(body.code ?? '')) return denial;
  }
  return 'allowed';
}
