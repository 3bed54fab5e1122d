// Shape of a solver job (learn or retarget) and its check; profiles and shots both show jobs.
import { asObject, num, oneOf, optNum, optStr, str, type Json } from '@/lib/parse-answer';

/** Where a job is: `queued → solving → solved | failed | canceled`. */
export type JobState = 'queued' | 'solving' | 'solved' | 'failed' | 'canceled';
/** Every job state in its order. */
export const JOB_STATES: readonly JobState[] = [
  'queued',
  'solving',
  'solved',
  'failed',
  'canceled',
];

/** Learning builds a profile; retargeting builds a take. */
export type JobKind = 'learn' | 'retarget';

/** One solver run. */
export interface Job {
  id: string;
  kind: JobKind;
  state: JobState;
  stage: string | null;
  percent: number;
  attempts: number;
  errorCode: string | null;
  errorMessage: string | null;
  shotId: string | null;
  profileId: string | null;
  takeId: string | null;
  controls: Record<string, unknown> | null;
  submittedBy: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

/** True once a job can no longer change. */
export function isJobFinished(state: JobState | null | undefined): boolean {
  return state === 'solved' || state === 'failed' || state === 'canceled';
}

/** Checks a job answer and returns it typed. */
export function parseJob(value: unknown): Job {
  const what = 'job';
  const b = asObject(value, what);
  const percent = num(b, 'percent', what);
  return {
    id: str(b, 'id', what),
    kind: oneOf(b, 'kind', ['learn', 'retarget'] as const, what),
    state: oneOf(b, 'state', JOB_STATES, what),
    stage: optStr(b, 'stage'),
    percent: Math.min(100, Math.max(0, percent)),
    attempts: optNum(b, 'attempts') ?? 0,
    errorCode: optStr(b, 'errorCode'),
    errorMessage: optStr(b, 'errorMessage'),
    shotId: optStr(b, 'shotId'),
    profileId: optStr(b, 'profileId'),
    takeId: optStr(b, 'takeId'),
    controls: typeof b.controls === 'object' && b.controls !== null ? (b.controls as Json) : null,
    submittedBy: optStr(b, 'submittedBy'),
    createdAt: optStr(b, 'createdAt') ?? '',
    startedAt: optStr(b, 'startedAt'),
    finishedAt: optStr(b, 'finishedAt'),
  };
}

/** A job with a progress or state event applied; events for other jobs leave it as it is. */
export function applyJobEvent(
  job: Job,
  event: {
    jobId: string;
    state?: JobState;
    stage?: string;
    percent?: number;
    errorCode?: string | null;
    errorMessage?: string | null;
  },
): Job {
  if (event.jobId !== job.id || isJobFinished(job.state)) return job;
  return {
    ...job,
    state:
      event.state ??
      (event.percent !== undefined && job.state === 'queued' ? 'solving' : job.state),
    stage: event.stage ?? job.stage,
    percent: event.percent ?? (event.state === 'solved' ? 100 : job.percent),
    errorCode: event.errorCode ?? job.errorCode,
    errorMessage: event.errorMessage ?? job.errorMessage,
  };
}
