import { DomainError } from '../common/errors/domain-error';
import type { JobState } from './job-state';

/** No such learn or retarget job in the show. */
export const jobNotFound = (id: string) =>
  new DomainError('not_found', 'JOB_NOT_FOUND', `No job ${id} in this show.`, { jobId: id });

/** A finished job cannot be canceled. */
export const cannotCancel = (id: string, state: JobState) =>
  new DomainError(
    'conflict',
    'INVALID_STATE_CHANGE',
    `Job ${id} is already ${state}; only queued or solving jobs can be canceled.`,
    { jobId: id, state },
  );

/** The job queue (Redis) failed; nothing was kept. */
export const jobsUnavailable = (cause: unknown) =>
  new DomainError(
    'unavailable',
    'JOBS_UNAVAILABLE',
    `The job queue cannot be reached right now; nothing was submitted. Try again. (${(cause as Error)?.name ?? 'error'})`,
  );
