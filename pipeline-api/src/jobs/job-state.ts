import { DomainError } from '../common/errors/domain-error';

/** Per learn or retarget job: `queued → solving → solved | failed | canceled`. */
export enum JobState {
  Queued = 'queued',
  Solving = 'solving',
  Solved = 'solved',
  Failed = 'failed',
  Canceled = 'canceled',
}

/** Allowed moves; a crashed worker's job goes back from solving to queued to run again. */
export const JOB_TRANSITIONS: Record<JobState, readonly JobState[]> = {
  [JobState.Queued]: [JobState.Solving, JobState.Canceled, JobState.Failed],
  [JobState.Solving]: [JobState.Solved, JobState.Failed, JobState.Canceled, JobState.Queued],
  [JobState.Solved]: [],
  [JobState.Failed]: [],
  [JobState.Canceled]: [],
};

/** True for the states a job never leaves. */
export const isFinished = (s: JobState): boolean => JOB_TRANSITIONS[s].length === 0;

/** Throws JOB_STATE_INVALID_TRANSITION unless `from → to` is allowed. */
export function assertJobTransition(from: JobState, to: JobState): void {
  if (JOB_TRANSITIONS[from].includes(to)) return;
  throw new DomainError(
    'conflict',
    'JOB_STATE_INVALID_TRANSITION',
    `A job cannot go from ${from} to ${to}.`,
    { from, to, allowed: JOB_TRANSITIONS[from] },
  );
}
