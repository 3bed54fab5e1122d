// Who may do what in the studio, written from product.md's Roles table. The API enforces the
// same rules on every route; the client reads them only to hide what a role cannot use.

/** A user's role, as the API names it. */
export type Role = 'admin' | 'technical_artist' | 'animator' | 'supervisor' | 'producer';

/** Every role, in the order screens list them. */
export const ROLES: readonly Role[] = [
  'admin',
  'technical_artist',
  'animator',
  'supervisor',
  'producer',
];

/** Each role in words, for labels and menus. */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  technical_artist: 'Technical artist',
  animator: 'Animator',
  supervisor: 'Supervisor',
  producer: 'Producer',
};

/** What a user might try to do; each name follows a phrase of the Roles table. */
export type Action =
  /** Upload characters, captures and clips. */
  | 'upload'
  /** See captures (biometric data): not animators. */
  | 'viewCaptures'
  /** Delete a capture and its files. */
  | 'deleteCapture'
  /** Learn a tissue profile from a capture. */
  | 'learn'
  /** Create a shot. */
  | 'createShot'
  /** Change a shot's fields (frame range, character, clip…). */
  | 'editShot'
  /** Set a shot's due date and assignees. */
  | 'planShot'
  /** Submit a retarget job (animators: re-solves). */
  | 'submitJob'
  /** Cancel a running retarget job. */
  | 'cancelJob'
  /** Move the controls of a take live. */
  | 'tuneTake'
  /** Save tuned controls as a new take. */
  | 'saveTake'
  /** Write a note on a take. */
  | 'writeNote'
  /** Resolve or reopen a note. */
  | 'resolveNote'
  /** Approve a take or request changes. */
  | 'decide'
  /** Set a shot's render state by hand. */
  | 'setRenderState'
  /** Open the Tracking screen: counts, charts, the shot table. */
  | 'track'
  /** Download reports (CSV). */
  | 'exportReports'
  /** Manage users, roles, shows, memberships and pipeline tokens. */
  | 'admin';

// Admins may do everything, so they are not listed here.
const ALLOWED: Record<Exclude<Role, 'admin'>, readonly Action[]> = {
  technical_artist: [
    'upload',
    'viewCaptures',
    'deleteCapture',
    'learn',
    'createShot',
    'editShot',
    'submitJob',
    'cancelJob',
  ],
  animator: ['tuneTake', 'saveTake', 'submitJob', 'writeNote'],
  supervisor: ['viewCaptures', 'writeNote', 'resolveNote', 'decide'],
  producer: ['viewCaptures', 'planShot', 'setRenderState', 'track', 'exportReports'],
};

/** True when a user with `role` may do `action`; false for no role (signed out). */
export function can(role: Role | undefined, action: Action): boolean {
  if (role === undefined) return false;
  if (role === 'admin') return true;
  return ALLOWED[role].includes(action);
}

/** True when the value is one of the API's role names. */
export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
