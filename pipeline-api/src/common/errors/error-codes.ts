// Every stable error code the API answers with, its HTTP status and what it means. The OpenAPI
// document lists them per route (see ApiErrors), so pipeline scripts can branch on `code`.

/** One entry of the catalogue. */
export interface ErrorCodeInfo {
  status: number;
  description: string;
}

/** The catalogue of error codes. */
export const ERROR_CODES = {
  VALIDATION_FAILED: {
    status: 400,
    description: 'Some fields are not valid; `details` lists them.',
  },
  MALFORMED_JSON: { status: 400, description: 'The body is not valid JSON.' },
  LINK_INVALID: {
    status: 400,
    description: 'The e-mailed link is unknown, already used or expired.',
  },
  INVALID_CREDENTIALS: { status: 401, description: 'Wrong e-mail or password.' },
  NOT_SIGNED_IN: { status: 401, description: 'No valid session cookie or pipeline token.' },
  TOKEN_INVALID: { status: 401, description: 'The pipeline token is unknown or revoked.' },
  ACCOUNT_DISABLED: { status: 403, description: 'The account is disabled; ask an admin.' },
  NO_ACCESS_RULE: { status: 403, description: 'No rule allows this route.' },
  ROLE_NOT_ALLOWED: { status: 403, description: "The caller's role may not use this route." },
  TOKEN_NOT_ALLOWED: { status: 403, description: 'Pipeline tokens may not use this route.' },
  TOKEN_SCOPE_MISSING: { status: 403, description: 'The pipeline token lacks the needed scope.' },
  SHOW_NOT_FOUND: {
    status: 404,
    description: 'No such show, or the caller is not a member of it (the two look the same).',
  },
  PING_NOT_FOUND: { status: 404, description: 'No such diagnostic ping; it may have expired.' },
  USER_NOT_FOUND: { status: 404, description: 'No such user.' },
  MEMBERSHIP_NOT_FOUND: { status: 404, description: 'The user is not a member of the show.' },
  TOKEN_NOT_FOUND: { status: 404, description: 'No such pipeline token in this show.' },
  OUTBOX_DISABLED: { status: 404, description: 'The mail outbox exists in development only.' },
  USER_EXISTS: { status: 409, description: 'A user with this e-mail address exists.' },
  SHOW_CODE_TAKEN: { status: 409, description: 'Another show has this code.' },
  MEMBERSHIP_EXISTS: { status: 409, description: 'The user is already a member of the show.' },
  LAST_ADMIN: { status: 409, description: 'The last active admin cannot be demoted or disabled.' },
  SIGN_IN_THROTTLED: {
    status: 429,
    description: 'Too many failed sign-ins; `details.retryAfterSeconds` says when to retry.',
  },
  TOO_MANY_REQUESTS: { status: 429, description: 'Too many requests from this address.' },
  SIGN_IN_UNAVAILABLE: { status: 503, description: 'Sign-in cannot check its limits right now.' },
  MAIL_UNAVAILABLE: { status: 503, description: 'The e-mail queue cannot be reached.' },
  OUTBOX_UNAVAILABLE: { status: 503, description: 'The local mail sink cannot be read.' },
} as const satisfies Record<string, ErrorCodeInfo>;

/** A code of the catalogue. */
export type ErrorCode = keyof typeof ERROR_CODES;
