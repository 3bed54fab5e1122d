// How a solve ends when it does not solve: bad input fails at once with a code and a sentence that
// says what to do; the job being canceled, handed back or taken over stops quietly; anything else
// is a fault that BullMQ retries with backoff.
import { isSolverInputError, type ErrorLocation } from '@overshoot/solver';
import { DomainError } from '../../common/errors/domain-error';

/** The job was canceled: stop and write nothing. */
export class JobCanceled extends Error {
  constructor() {
    super('the job was canceled');
    this.name = 'JobCanceled';
  }
}

/** Another attempt owns the job now (this one lost its lock): stop and touch nothing. */
export class JobTakenOver extends Error {
  constructor() {
    super('another worker runs this job now');
    this.name = 'JobTakenOver';
  }
}

/** The worker is shutting down: hand the job back to the queue. */
export class JobReleased extends Error {
  constructor() {
    super('the worker is shutting down');
    this.name = 'JobReleased';
  }
}

/** What to do about each solver input error. */
const ADVICE: Record<string, string> = {
  NO_MOTION:
    'Learn from a capture in which the soft tissue visibly moves (lag, overshoot, settle after the limbs stop).',
  VERTEX_COUNT_MISMATCH: 'Learn the capture on the character it was registered to.',
  TRIANGLE_MISMATCH: 'Learn the capture on the character it was registered to.',
  NO_FRAMES: 'Upload a file with animation frames.',
  NON_FINITE_VALUE: 'Upload the file again without the broken values.',
  MISSING_JOINT: "Set a clip made for the shot's character on the shot.",
  CLIP_TOO_SHORT: "Lengthen the shot's frame range or lower controls.prerollSeconds.",
  UNMAPPED_DRIVER:
    "Map the profile's driver joints in jointMap (GET …/shots/:shotId/joint-map shows them).",
  BAD_JOINT_MAP: 'Fix jointMap: it must name joints of the profile and of the character.',
  PROFILE_MISMATCH: 'Learn the profile again.',
  NOT_A_PROFILE: 'The stored profile file is damaged: learn the profile again.',
  UNSUPPORTED_FORMAT_VERSION: 'Learn the profile again with this version.',
  BAD_CONTROL: 'Fix the controls.',
  UNKNOWN_REGION: "Use region names of the shot's character in controls.regionGains.",
  BAD_FRAME_RANGE: "Fix the shot's frame range to lie inside the clip.",
  BAD_FPS: "Fix the shot's fps.",
};

const place = (where: ErrorLocation | Record<string, unknown>): string => {
  const parts = Object.entries(where ?? {})
    .filter(([, v]) => v !== undefined && v !== null && v !== '')
    .map(([k, v]) => `${k} ${String(v)}`);
  return parts.length > 0 ? ` (${parts.join(', ')})` : '';
};

/** A failure the job ends with, no retry: its stable code and what to do. */
export interface BadInput {
  code: string;
  message: string;
}

/**
 * Bad input — a solver input error, or a domain error such as an expired consent — as the code
 * and message the job records; null for anything else (a fault to retry).
 */
export function badInput(e: unknown): BadInput | null {
  if (isSolverInputError(e)) {
    const advice = ADVICE[e.code] ?? 'Fix the input named above, then submit again.';
    return { code: e.code, message: `${e.message}${place(e.where)}. ${advice}` };
  }
  if (e instanceof DomainError && e.kind !== 'unavailable') {
    return { code: e.code, message: e.message };
  }
  return null;
}

/** The message of a job that failed on faults every time it ran. */
export const faultMessage = (attempts: number, e: unknown) =>
  `The solve stopped ${attempts} time(s) on a fault: ${(e as Error)?.message ?? e}. ` +
  'If a service (S3 store, database, Redis) was down, submit it again; if it keeps failing, tell an admin.';
