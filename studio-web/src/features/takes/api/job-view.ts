// Shape of a retarget job as the API shows it, and its check.
import { asObject, num, oneOf, optStr, str } from './parse';
import { JOB_STATES, type JobState } from './take-view';

/** One solver run (a "save as new take" is a retarget job). */
export interface RetargetJob {
  id: string;
  kind: 'learn' | 'retarget';
  state: JobState;
  stage: string | null;
  /** 0–100. */
  percent: number;
  errorCode: string | null;
  errorMessage: string | null;
  shotId: string | null;
  profileId: string | null;
  takeId: string | null;
  createdAt: string;
}

/** True once a job can no longer change. */
export function isJobFinished(state: JobState | undefined): boolean {
  return state === 'solved' || state === 'failed' || state === 'canceled';
}

/** Checks a job answer and returns it typed. */
export function parseJob(value: unknown): RetargetJob {
  const what = 'job';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    kind: oneOf(b, 'kind', ['learn', 'retarget'] as const, what),
    state: oneOf(b, 'state', JOB_STATES, what),
    stage: optStr(b, 'stage'),
    percent: Math.min(100, Math.max(0, num(b, 'percent', what))),
    errorCode: optStr(b, 'errorCode'),
    errorMessage: optStr(b, 'errorMessage'),
    shotId: optStr(b, 'shotId'),
    profileId: optStr(b, 'profileId'),
    takeId: optStr(b, 'takeId'),
    createdAt: str(b, 'createdAt', what),
  };
}
