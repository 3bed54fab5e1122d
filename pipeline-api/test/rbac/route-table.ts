// Who may call each route, written by hand from product.md's roles, NOT read from the
// decorators: the matrix test compares the two, so a wrong decorator fails it. Every route of
// the app needs a row here; a new route without one fails the test.
//
// To add a route: one row with its method and path as the controller declares it, the roles
// that may call it (admins always may; leave them out), and the pipeline token scope that may
// call it, if any. Give a `body` when the empty body would start real work.
import { Role } from '../../src/users/entities/role';
import { TokenScope } from '../../src/tokens/token-scope';

/** Who may call a route. */
export interface RouteRow {
  /** `METHOD /api/path/:param` exactly as the app declares it. */
  route: string;
  /** `public`, or the roles besides admin that may call it (`[]`: admins only). */
  roles: 'public' | readonly Role[];
  /** A pipeline token of the route's show with this scope (or `any` token) may call it. */
  token?: TokenScope | 'any';
  /** The body to send (default `{}`); every request must be harmless for the allowed callers. */
  body?: object;
  /** The call ends the caller's session: sign in afresh for it. */
  freshSession?: boolean;
}

const PUBLIC = 'public';
const ADMINS: readonly Role[] = [];
const ANYONE: readonly Role[] = [
  Role.TechnicalArtist,
  Role.Animator,
  Role.Supervisor,
  Role.Producer,
];

/** The expectation table. */
export const ROUTE_TABLE: RouteRow[] = [
  // Service status, for the status page and pipeline checks.
  { route: 'GET /api/health', roles: PUBLIC },
  { route: 'POST /api/diagnostics/pings', roles: PUBLIC, body: { steps: 0 } },
  { route: 'GET /api/diagnostics/pings/:id', roles: PUBLIC },

  // Accounts: sign-in and e-mailed links need no session.
  { route: 'POST /api/auth/sign-in', roles: PUBLIC },
  { route: 'POST /api/auth/password-reset', roles: PUBLIC },
  { route: 'POST /api/auth/password-reset/confirm', roles: PUBLIC },
  { route: 'POST /api/auth/invitations/lookup', roles: PUBLIC },
  { route: 'POST /api/auth/invitations/accept', roles: PUBLIC },
  { route: 'POST /api/auth/sign-out', roles: ANYONE, freshSession: true },
  { route: 'GET /api/auth/me', roles: ANYONE, token: 'any' },

  // Shows: members see theirs; a token sees its own show.
  { route: 'GET /api/shows', roles: ANYONE, token: 'any' },
  { route: 'GET /api/shows/:showId', roles: ANYONE, token: 'any' },
  { route: 'GET /api/shows/:showId/members', roles: ANYONE },

  // Admin: users, roles, shows, memberships, tokens, outbox (product.md: admin only).
  { route: 'GET /api/admin/users', roles: ADMINS },
  { route: 'PATCH /api/admin/users/:userId', roles: ADMINS },
  { route: 'POST /api/admin/invitations', roles: ADMINS },
  { route: 'GET /api/admin/invitations', roles: ADMINS },
  { route: 'GET /api/admin/shows', roles: ADMINS },
  { route: 'POST /api/admin/shows', roles: ADMINS },
  { route: 'PATCH /api/admin/shows/:showId', roles: ADMINS },
  { route: 'POST /api/admin/shows/:showId/members', roles: ADMINS },
  { route: 'DELETE /api/admin/shows/:showId/members/:userId', roles: ADMINS },
  { route: 'POST /api/admin/shows/:showId/tokens', roles: ADMINS },
  { route: 'GET /api/admin/shows/:showId/tokens', roles: ADMINS },
  { route: 'DELETE /api/admin/shows/:showId/tokens/:tokenId', roles: ADMINS },
  { route: 'GET /api/admin/outbox', roles: ADMINS },
];
