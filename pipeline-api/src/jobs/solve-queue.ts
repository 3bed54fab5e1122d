// The two solver queues: what a queued job carries and how BullMQ treats it. The database row is
// the record; the queue entry only says which row to run, under the same id.
import type { JobsOptions, Queue } from 'bullmq';
import type { Env } from '../config/env.validation';

/** What a learn or retarget queue entry carries: the job row to run. */
export interface SolveJobData {
  jobId: string;
  showId: string;
}

/** How a solve ended, as BullMQ records it. */
export interface SolveOutcome {
  outcome: 'solved' | 'canceled' | 'skipped';
}

/** The learn queue. */
export type LearnQueue = Queue<SolveJobData, SolveOutcome, 'learn'>;
/** The retarget queue. */
export type RetargetQueue = Queue<SolveJobData, SolveOutcome, 'retarget'>;

/**
 * Queue options of a solve: the row's id as the queue id (adding it twice adds it once), retries
 * with exponential backoff for faults, and finished entries dropped after a while (the row stays).
 */
export const solveJobOptions = (env: Env, jobId: string): JobsOptions => ({
  jobId,
  attempts: env.SOLVE_MAX_ATTEMPTS,
  backoff: { type: 'exponential', delay: env.SOLVE_BACKOFF_MS },
  removeOnComplete: { age: 86_400, count: 1000 },
  removeOnFail: { age: 7 * 86_400 },
});
