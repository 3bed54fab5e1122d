// Shape of a take as the API shows it, and its check.
import { asArray, asObject, num, oneOf, optStr, str } from '@/lib/parse-answer';

/** Per take: `awaiting review → approved | changes requested`. */
export type ReviewState = 'awaiting_review' | 'approved' | 'changes_requested';
/** Every review state. */
export const REVIEW_STATES: readonly ReviewState[] = [
  'awaiting_review',
  'approved',
  'changes_requested',
];

/** Where a retarget job is: `queued → solving → solved | failed | canceled`. */
export type JobState = 'queued' | 'solving' | 'solved' | 'failed' | 'canceled';
/** Every job state. */
export const JOB_STATES: readonly JobState[] = [
  'queued',
  'solving',
  'solved',
  'failed',
  'canceled',
];

/** A take: the versioned result of a retarget job. */
export interface Take {
  id: string;
  shotId: string;
  version: number;
  jobId: string;
  solveState: JobState;
  /** The controls the take was made with (solver `Controls`). */
  controls: Record<string, unknown>;
  metrics: Record<string, unknown> | null;
  files: string[];
  reviewState: ReviewState;
  createdBy: string | null;
  createdAt: string;
  reviewedAt: string | null;
}

/** Checks a take answer and returns it typed. */
export function parseTake(value: unknown): Take {
  const what = 'take';
  const b = asObject(value, what);
  const controls = b.controls;
  const metrics = b.metrics;
  return {
    id: str(b, 'id', what),
    shotId: str(b, 'shotId', what),
    version: num(b, 'version', what),
    jobId: str(b, 'jobId', what),
    solveState: oneOf(b, 'solveState', JOB_STATES, what),
    controls: typeof controls === 'object' && controls !== null ? (controls as never) : {},
    metrics: typeof metrics === 'object' && metrics !== null ? (metrics as never) : null,
    files: Array.isArray(b.files) ? b.files.filter((f): f is string => typeof f === 'string') : [],
    reviewState: oneOf(b, 'reviewState', REVIEW_STATES, what),
    createdBy: optStr(b, 'createdBy'),
    createdAt: str(b, 'createdAt', what),
    reviewedAt: optStr(b, 'reviewedAt'),
  };
}

/** Checks a list of takes. */
export function parseTakes(value: unknown): Take[] {
  return asArray(value, 'takes').map(parseTake);
}
