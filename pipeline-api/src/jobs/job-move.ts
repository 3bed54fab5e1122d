import { assertJobTransition, JobState } from './job-state';

/** The state fields every job row has, learn or retarget. */
export interface JobRecord {
  state: JobState;
  stage?: string | null;
  percent: number;
  attempts: number;
  errorCode?: string | null;
  errorMessage?: string | null;
  worker?: string | null;
  startedAt?: Date | null;
  finishedAt?: Date | null;
}

/** What a move records: who runs it, or why it failed. */
export interface MoveInfo {
  /** The worker attempt that takes the job (on `solving`). */
  worker?: string;
  /** Stable code of a failure (on `failed`). */
  errorCode?: string;
  /** What happened and what to do (on `failed`, or a note when a fault sends it back). */
  message?: string;
}

/**
 * Moves a job along `queued → solving → solved | failed | canceled` (and `solving → queued` when
 * its worker is lost or a fault retries it); throws JOB_STATE_INVALID_TRANSITION on a bad move.
 */
export function applyJobMove(job: JobRecord, to: JobState, info: MoveInfo = {}): void {
  assertJobTransition(job.state, to);
  const now = new Date();
  job.state = to;
  if (to === JobState.Solving) {
    job.attempts += 1;
    job.startedAt = now;
    job.worker = info.worker ?? job.worker;
    job.errorMessage = null;
  }
  if (to === JobState.Queued) {
    // It starts again from the beginning.
    job.stage = null;
    job.percent = 0;
    job.errorMessage = info.message ?? null;
  }
  if (to === JobState.Solved || to === JobState.Failed || to === JobState.Canceled) {
    job.finishedAt = now;
    job.percent = to === JobState.Solved ? 100 : job.percent;
  }
  if (to === JobState.Solved) job.stage = 'done';
  if (to === JobState.Failed) {
    job.errorCode = info.errorCode ?? 'SOLVE_FAILED';
    job.errorMessage = info.message ?? null;
  }
}
