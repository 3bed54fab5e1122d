import type { Logger } from '@nestjs/common';
import type { MikroORM } from '@mikro-orm/core';
import { DelayedError, UnrecoverableError, type Job } from 'bullmq';
import type { StorageService } from '../../storage/storage.service';
import type { JobEventsPublisher } from '../../events/job-events-publisher';
import type { AnyJob, JobKindOps } from '../job-kinds';
import type { SolveJobData, SolveOutcome } from '../solve-queue';
import { JobAttempt } from './job-attempt';
import { jobObjectKey, type JobOutputFile } from './object-store';
import { badInput, faultMessage, JobCanceled, JobReleased, JobTakenOver } from './solve-failures';

/** The worker's services a runner's attempt uses. */
export interface RunnerServices {
  orm: MikroORM;
  events: JobEventsPublisher;
  storage: StorageService;
  logger: Logger;
}

/** One queue entry as the worker hands it to a runner. */
export interface QueuedRun {
  job: Job<SolveJobData, SolveOutcome>;
  token: string | undefined;
  /** Aborts when the worker shuts down and hands the job back. */
  released: AbortSignal;
}

/**
 * Runs one attempt of a job of kind `ops` whose output is `file` under the job's key (the same
 * key every attempt, removed again when the job ends without a result); `work` does the solve.
 */
export function runJobAttempt<J extends AnyJob>(
  services: RunnerServices,
  ops: JobKindOps<J>,
  file: JobOutputFile,
  { job, token, released }: QueuedRun,
  work: (attempt: JobAttempt<J>, key: string) => Promise<void>,
): Promise<SolveOutcome> {
  const { orm, events, storage, logger } = services;
  const { jobId, showId } = job.data;
  const attempt = new JobAttempt(orm, events, ops, jobId, showId, released);
  const key = jobObjectKey(showId, jobId, file);
  const cleanup = () => storage.delete(key);
  return runAttempt({ attempt, job, token, logger, cleanup }, () => work(attempt, key));
}

/** What one run of a queue entry needs. */
export interface AttemptContext<J extends AnyJob> {
  attempt: JobAttempt<J>;
  job: Job<SolveJobData, SolveOutcome>;
  token: string | undefined;
  logger: Logger;
  /** Removes what the attempt may have written (a job that ends without a result). */
  cleanup: () => Promise<void>;
}

/**
 * Runs `work` as one attempt and turns how it ends into what BullMQ and the row should say:
 * solved; canceled (quietly, output removed); taken over by another worker (quietly, nothing
 * touched); handed back on shutdown (queued again at once, no attempt used); bad input (failed
 * with its code, no retry); a fault (queued again, retried with backoff; failed after the last).
 */
export async function runAttempt<J extends AnyJob>(
  ctx: AttemptContext<J>,
  work: () => Promise<void>,
): Promise<SolveOutcome> {
  const { attempt, job, token, logger } = ctx;
  if (!(await attempt.start())) return { outcome: 'skipped' };
  try {
    await work();
    return { outcome: 'solved' };
  } catch (e) {
    if (e instanceof JobCanceled) {
      logger.log(`job ${attempt.jobId} canceled; it stopped`);
      await ctx.cleanup().catch((c: Error) => logger.warn(`cleanup: ${c.message}`));
      return { outcome: 'canceled' };
    }
    if (e instanceof JobTakenOver) {
      logger.warn(`job ${attempt.jobId} runs on another worker now; this attempt stops`);
      return { outcome: 'skipped' };
    }
    if (e instanceof JobReleased) {
      await attempt.requeue('Its worker shut down; it runs again on another.');
      await job.moveToDelayed(Date.now(), token);
      throw new DelayedError();
    }
    const bad = badInput(e);
    if (bad) {
      await attempt.fail(bad.code, bad.message);
      await ctx.cleanup().catch((c: Error) => logger.warn(`cleanup: ${c.message}`));
      throw new UnrecoverableError(`${bad.code}: ${bad.message}`);
    }
    const tries = job.attemptsMade + 1;
    logger.warn(`job ${attempt.jobId} attempt ${tries} stopped on a fault: ${(e as Error).stack}`);
    if (tries >= (job.opts.attempts ?? 1)) {
      await attempt.fail('SOLVE_FAILED', faultMessage(tries, e)).catch(() => undefined);
      await ctx.cleanup().catch(() => undefined);
    } else {
      const message = `Attempt ${tries} stopped on a fault (${(e as Error).message}); it runs again.`;
      await attempt.requeue(message).catch(() => undefined);
    }
    throw e;
  }
}
