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
  /** The route answers with an endless event stream: read the status, then hang up. */
  stream?: boolean;
}

const PUBLIC = 'public';
const ADMINS: readonly Role[] = [];
const ANYONE: readonly Role[] = [
  Role.TechnicalArtist,
  Role.Animator,
  Role.Supervisor,
  Role.Producer,
];
/** product.md: technical artists upload characters, captures and clips and create shots. */
const TA: readonly Role[] = [Role.TechnicalArtist];
/**
 * Captures are biometric data: the technical artists who upload and learn from them,
 * supervisors, and producers (who read everything in their shows); not animators.
 */
const CAPTURE_READERS: readonly Role[] = [Role.TechnicalArtist, Role.Supervisor, Role.Producer];
/** product.md: animators and supervisors write notes. */
const NOTE_WRITERS: readonly Role[] = [Role.Animator, Role.Supervisor];
/** product.md: technical artists submit retarget jobs; animators submit re-solves. */
const JOB_SUBMITTERS: readonly Role[] = [Role.TechnicalArtist, Role.Animator];
/** product.md: supervisors resolve notes and decide on takes. */
const SUPERVISORS: readonly Role[] = [Role.Supervisor];

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

  // Uploads (technical artists) and upload reports (the roles that may see captures).
  { route: 'POST /api/shows/:showId/uploads', roles: TA },
  { route: 'POST /api/shows/:showId/uploads/:assetId/parts', roles: TA },
  { route: 'POST /api/shows/:showId/uploads/:assetId/complete', roles: TA },
  { route: 'DELETE /api/shows/:showId/uploads/:assetId', roles: TA },
  { route: 'GET /api/shows/:showId/assets', roles: CAPTURE_READERS },
  { route: 'GET /api/shows/:showId/assets/:assetId', roles: CAPTURE_READERS },

  // Library: characters, clips and profiles for every member; captures for fewer.
  { route: 'GET /api/shows/:showId/characters', roles: ANYONE },
  { route: 'GET /api/shows/:showId/characters/:characterId', roles: ANYONE },
  { route: 'GET /api/shows/:showId/characters/:characterId/file', roles: ANYONE },
  { route: 'GET /api/shows/:showId/clips', roles: ANYONE },
  { route: 'GET /api/shows/:showId/clips/:clipId', roles: ANYONE },
  { route: 'GET /api/shows/:showId/clips/:clipId/file', roles: ANYONE },
  { route: 'GET /api/shows/:showId/profiles', roles: ANYONE },
  { route: 'GET /api/shows/:showId/profiles/:profileId', roles: ANYONE },
  { route: 'GET /api/shows/:showId/profiles/:profileId/file', roles: ANYONE },
  // product.md: technical artists learn profiles; a pipeline token submits jobs.
  { route: 'POST /api/shows/:showId/profiles', roles: TA, token: TokenScope.JobsSubmit },
  { route: 'GET /api/shows/:showId/captures', roles: CAPTURE_READERS },
  { route: 'GET /api/shows/:showId/captures/:captureId', roles: CAPTURE_READERS },
  { route: 'GET /api/shows/:showId/captures/:captureId/file', roles: CAPTURE_READERS },
  // product.md: deleting a capture is for admins and technical artists.
  { route: 'DELETE /api/shows/:showId/captures/:captureId', roles: TA },

  // Shots: everyone reads (tokens too, e.g. the render farm finding its shot); technical
  // artists create; producers set due dates and assignees; tracking views for every member.
  { route: 'GET /api/shows/:showId/shots', roles: ANYONE, token: 'any' },
  { route: 'GET /api/shows/:showId/shots/export', roles: ANYONE },
  { route: 'GET /api/shows/:showId/shots/summary', roles: ANYONE },
  { route: 'GET /api/shows/:showId/shots/throughput', roles: ANYONE },
  { route: 'POST /api/shows/:showId/shots', roles: TA },
  { route: 'GET /api/shows/:showId/shots/:shotId', roles: ANYONE, token: 'any' },
  { route: 'PATCH /api/shows/:showId/shots/:shotId', roles: [Role.TechnicalArtist, Role.Producer] },
  // product.md: producers manage render state by hand; the render farm reports it by token.
  {
    route: 'PUT /api/shows/:showId/shots/:shotId/render-state',
    roles: [Role.Producer],
    token: TokenScope.RenderWrite,
  },

  // Takes: everyone reads; tokens with takes:read.
  {
    route: 'GET /api/shows/:showId/shots/:shotId/takes',
    roles: ANYONE,
    token: TokenScope.TakesRead,
  },
  { route: 'GET /api/shows/:showId/takes/:takeId', roles: ANYONE, token: TokenScope.TakesRead },
  {
    route: 'GET /api/shows/:showId/takes/:takeId/file',
    roles: ANYONE,
    token: TokenScope.TakesRead,
  },

  // Jobs: every member follows them (a token reads one, e.g. the job it submitted); technical
  // artists submit retargets and animators re-solves ("save as new take"), tokens with
  // jobs:submit too. Canceling passes the access rules for every member: who submitted it is
  // checked on the job itself (admins, technical artists or the submitter).
  { route: 'GET /api/shows/:showId/jobs', roles: ANYONE },
  { route: 'GET /api/shows/:showId/jobs/:jobId', roles: ANYONE, token: 'any' },
  { route: 'POST /api/shows/:showId/jobs/:jobId/cancel', roles: ANYONE },
  {
    route: 'POST /api/shows/:showId/shots/:shotId/jobs',
    roles: JOB_SUBMITTERS,
    token: TokenScope.JobsSubmit,
  },
  { route: 'GET /api/shows/:showId/shots/:shotId/joint-map', roles: JOB_SUBMITTERS },

  // Review.
  { route: 'GET /api/shows/:showId/takes/:takeId/notes', roles: ANYONE },
  { route: 'POST /api/shows/:showId/takes/:takeId/notes', roles: NOTE_WRITERS },
  { route: 'PATCH /api/shows/:showId/notes/:noteId', roles: NOTE_WRITERS },
  { route: 'POST /api/shows/:showId/notes/:noteId/resolve', roles: SUPERVISORS },
  { route: 'POST /api/shows/:showId/notes/:noteId/reopen', roles: SUPERVISORS },
  { route: 'GET /api/shows/:showId/takes/:takeId/decisions', roles: ANYONE },
  { route: 'POST /api/shows/:showId/takes/:takeId/decisions', roles: SUPERVISORS },

  // Live progress: every member of the show follows its jobs; any token of the show may too
  // (a pipeline script waiting for its job). Upload progress inside is narrower (see events/).
  { route: 'GET /api/shows/:showId/events', roles: ANYONE, token: 'any', stream: true },
];
