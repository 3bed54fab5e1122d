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
  // Uploads and the library.
  UPLOAD_TOO_LARGE: {
    status: 413,
    description: 'The declared file size is above the limit for its kind; `details.limit` says it.',
  },
  UPLOAD_FILE_TYPE: {
    status: 400,
    description:
      'The file name does not fit the kind (characters and captures: .glb; clips: .bvh or .glb).',
  },
  CONSENT_REQUIRED: {
    status: 400,
    description:
      'A capture upload needs the consent record: performer code, scope and expiry date.',
  },
  CONSENT_EXPIRED: {
    status: 400,
    description:
      "The consent record's expiry date has passed (at upload, or a capture no longer usable for learning).",
  },
  UPLOAD_NOT_OPEN: {
    status: 409,
    description: 'The upload is not waiting for parts (completed, aborted or never started).',
  },
  UPLOAD_PARTS_INVALID: {
    status: 400,
    description: 'The parts listed do not match what was uploaded; `details` says which.',
  },
  UPLOAD_SIZE_MISMATCH: {
    status: 400,
    description: 'The stored file is not the declared size; the file was deleted.',
  },
  STORAGE_UNAVAILABLE: { status: 503, description: 'The S3 store cannot be reached; try again.' },
  INGEST_UNAVAILABLE: {
    status: 503,
    description: 'The ingest queue cannot be reached; try again.',
  },
  ASSET_NOT_FOUND: { status: 404, description: 'No such asset in this show.' },
  ASSET_NOT_READY: {
    status: 409,
    description: 'The file has not passed its check (pending or rejected).',
  },
  CHARACTER_NOT_FOUND: { status: 404, description: 'No such character in this show.' },
  CHARACTER_NOT_READY: { status: 409, description: 'The character has not passed its check yet.' },
  CAPTURE_NOT_FOUND: { status: 404, description: 'No such capture in this show.' },
  CAPTURE_DELETED: {
    status: 409,
    description: 'The capture was deleted; only its record remains.',
  },
  CLIP_NOT_FOUND: { status: 404, description: 'No such clip in this show.' },
  CLIP_NOT_READY: { status: 409, description: 'The clip has not passed its check yet.' },
  PROFILE_NOT_FOUND: { status: 404, description: 'No such tissue profile in this show.' },
  PROFILE_NOT_READY: {
    status: 409,
    description: 'The tissue profile has not finished learning (or its learning failed).',
  },
  // Shots and tracking.
  SHOT_NOT_FOUND: { status: 404, description: 'No such shot in this show.' },
  SHOT_CODE_TAKEN: { status: 409, description: 'Another shot of the show has this code.' },
  SHOT_FRAME_RANGE_INVALID: {
    status: 400,
    description: 'The frame range is empty or outside the clip; `details` gives the bounds.',
  },
  SHOT_ASSIGNEE_INVALID: { status: 400, description: 'An assignee is not a member of the show.' },
  SHOT_FIELDS_NOT_ALLOWED: {
    status: 403,
    description: "The caller's role may change only some fields (producers: due date, assignees).",
  },
  RENDER_STATE_INVALID_TRANSITION: {
    status: 409,
    description: 'The render state cannot move that way; `details.allowed` lists the moves.',
  },
  JOB_STATE_INVALID_TRANSITION: {
    status: 409,
    description: 'The job cannot move that way.',
  },
  // Learn and retarget jobs.
  JOB_NOT_FOUND: { status: 404, description: 'No such learn or retarget job in this show.' },
  INVALID_STATE_CHANGE: {
    status: 409,
    description: 'The job has finished (solved, failed or canceled); it can no longer be canceled.',
  },
  JOB_NOT_SUBMITTER: {
    status: 403,
    description: 'Only admins, technical artists and the person who submitted a job may cancel it.',
  },
  JOBS_UNAVAILABLE: { status: 503, description: 'The job queue cannot be reached; try again.' },
  SHOT_NOT_READY: {
    status: 409,
    description: 'The shot has no target character or no clip yet; set both before solving.',
  },
  UNMAPPED_DRIVERS: {
    status: 400,
    description:
      "Driver joints of the profile that carry much of its input have no joint on the shot's character; `details.drivers` lists them: map them in `jointMap`.",
  },
  CLIP_TOO_SHORT: {
    status: 400,
    description:
      "The shot's frame range lasts less than the pre-roll; `details` gives both durations.",
  },
  // Takes and review.
  TAKE_NOT_FOUND: { status: 404, description: 'No such take in this show.' },
  JOB_NOT_FINISHED: { status: 409, description: 'A take comes only from a job that has solved.' },
  TAKE_NOT_SOLVED: {
    status: 409,
    description: "The take's job has not solved; it cannot be reviewed.",
  },
  TAKE_ALREADY_DECIDED: {
    status: 409,
    description: 'The take has a decision already; review the newer take.',
  },
  NOTE_NOT_FOUND: { status: 404, description: 'No such note in this show.' },
  NOTE_FRAME_OUT_OF_RANGE: {
    status: 400,
    description: "The frame is outside the shot's frame range; `details` gives the range.",
  },
  NOTE_MARK_INVALID: {
    status: 400,
    description: 'The drawn mark is not strokes of points in [0, 1]; `details` says where.',
  },
  NOTE_NOT_AUTHOR: { status: 403, description: 'Only the author of a note may edit it.' },
} as const satisfies Record<string, ErrorCodeInfo>;

/** A code of the catalogue. */
export type ErrorCode = keyof typeof ERROR_CODES;
