import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import { MikroORM } from '@mikro-orm/core';
import { Worker, type Job, type WorkerOptions } from 'bullmq';
import { Env } from '../../config/env.validation';
import { JobEventsPublisher } from '../../events/job-events-publisher';
import { QUEUES } from '../../queues/queue-names';
import { isFinished, JobState } from '../job-state';
import {
  LEARN_JOBS,
  RETARGET_JOBS,
  withLockedJob,
  type AnyJob,
  type JobKindOps,
} from '../job-kinds';
import type { LearnQueue, RetargetQueue, SolveJobData, SolveOutcome } from '../solve-queue';
import { LearnRunner } from './learn-runner';
import { RetargetRunner } from './retarget-runner';
import { JobReleased } from './solve-failures';

type SolveJob = Job<SolveJobData, SolveOutcome>;

/** Times a job may lose its worker (crash, kill) and run again before it fails. */
const MAX_STALLS = 2;

/**
 * The learn and retarget workers of this process, made here rather than by decorators so that
 * their lock and stall timings come from the environment. A worker that dies leaves its job's
 * lock to expire; another worker's stall check puts it back in the queue (and the row back to
 * queued) to run again. Shutting down stops taking jobs, lets running ones finish for
 * SOLVE_SHUTDOWN_GRACE_SECONDS, then hands the rest back to the queue at once.
 */
@Injectable()
export class SolveWorkers implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('SolveWorkers');
  private workers: Worker<SolveJobData, SolveOutcome>[] = [];
  /** Running jobs, to hand back on shutdown. */
  private readonly running = new Map<string, AbortController>();

  constructor(
    private readonly env: Env,
    private readonly orm: MikroORM,
    private readonly events: JobEventsPublisher,
    private readonly learn: LearnRunner,
    private readonly retarget: RetargetRunner,
    @InjectQueue(QUEUES.learn) private readonly learnQueue: LearnQueue,
    @InjectQueue(QUEUES.retarget) private readonly retargetQueue: RetargetQueue,
  ) {}

  onApplicationBootstrap(): void {
    const opts: WorkerOptions = {
      connection: {
        host: this.env.REDIS_HOST,
        port: this.env.REDIS_PORT,
        // BullMQ needs this so that blocking commands survive reconnects.
        maxRetriesPerRequest: null,
      },
      prefix: this.env.REDIS_PREFIX,
      concurrency: this.env.SOLVE_CONCURRENCY,
      lockDuration: this.env.SOLVE_LOCK_MS,
      stalledInterval: this.env.SOLVE_STALLED_CHECK_MS,
      maxStalledCount: MAX_STALLS,
    };
    this.workers = [
      this.start(
        QUEUES.learn,
        LEARN_JOBS,
        this.learnQueue,
        (j, t, s) => this.learn.run(j, t, s),
        opts,
      ),
      this.start(
        QUEUES.retarget,
        RETARGET_JOBS,
        this.retargetQueue,
        (j, t, s) => this.retarget.run(j, t, s),
        opts,
      ),
    ];
    this.logger.log(
      `learn and retarget: ${this.env.SOLVE_CONCURRENCY} at a time each, lock ${this.env.SOLVE_LOCK_MS} ms`,
    );
  }

  /** Stops taking jobs; running ones finish within the grace period or go back to the queue. */
  async onModuleDestroy(): Promise<void> {
    const closing = Promise.all(this.workers.map((w) => w.close()));
    const grace = setTimeout(() => {
      if (this.running.size > 0)
        this.logger.log(`handing ${this.running.size} running job(s) back to the queue`);
      for (const release of this.running.values()) release.abort(new JobReleased());
    }, this.env.SOLVE_SHUTDOWN_GRACE_SECONDS * 1000);
    await closing;
    clearTimeout(grace);
  }

  private start<J extends AnyJob>(
    name: string,
    ops: JobKindOps<J>,
    queue: LearnQueue | RetargetQueue,
    run: (job: SolveJob, token: string | undefined, released: AbortSignal) => Promise<SolveOutcome>,
    opts: WorkerOptions,
  ): Worker<SolveJobData, SolveOutcome> {
    const worker = new Worker<SolveJobData, SolveOutcome>(
      name,
      async (job, token) => {
        const release = new AbortController();
        const key = `${name}:${job.id}`;
        this.running.set(key, release);
        try {
          return await run(job, token, release.signal);
        } finally {
          this.running.delete(key);
        }
      },
      opts,
    );
    worker.on('error', (e) => this.logger.warn(`${name} worker: ${e.message}`));
    worker.on('stalled', (jobId) => void this.onStalled(ops, queue, jobId));
    worker.on('failed', (job, e) => void this.onFailed(ops, queue, job, e));
    return worker;
  }

  /**
   * A job whose worker stopped renewing its lock went back to the queue: its row goes back to
   * queued too, unless another attempt has picked it up already (it does the same on start).
   */
  private async onStalled<J extends AnyJob>(
    ops: JobKindOps<J>,
    queue: LearnQueue | RetargetQueue,
    jobId: string,
  ): Promise<void> {
    try {
      const moved = await withLockedJob(this.orm, ops, jobId, async (tx, job) => {
        if (!job || job.state !== JobState.Solving) return null;
        if ((await queue.getJobState(jobId)) === 'active') return null;
        const message = `Its worker (${job.worker ?? 'unknown'}) stopped; it runs again.`;
        await ops.move(tx, job, JobState.Queued, { message });
        return { ref: ops.ref(job), showId: job.show.id, message };
      });
      if (moved) {
        this.logger.warn(`job ${jobId} lost its worker; queued again`);
        await this.events.state(moved.showId, {
          ...moved.ref,
          state: JobState.Queued,
          errorMessage: moved.message,
        });
      }
    } catch (e) {
      this.logger.warn(`could not requeue stalled job ${jobId}: ${(e as Error).message}`);
    }
  }

  /**
   * A queue entry that failed for good while its row is not finished — it stalled too often, or
   * its attempt could not record the failure — fails the row with what happened.
   */
  private async onFailed<J extends AnyJob>(
    ops: JobKindOps<J>,
    queue: LearnQueue | RetargetQueue,
    job: SolveJob | undefined,
    e: Error,
  ): Promise<void> {
    if (!job?.id) return;
    const jobId = job.id;
    try {
      if ((await queue.getJobState(jobId)) !== 'failed') return;
      const stalled = /stalled/i.test(e.message);
      const code = stalled ? 'WORKER_LOST' : 'SOLVE_FAILED';
      const message = stalled
        ? `Its worker stopped ${MAX_STALLS + 1} times while solving it. Submit it again; if it keeps happening, tell an admin.`
        : e.message;
      const ref = await withLockedJob(this.orm, ops, jobId, async (tx, row) => {
        if (!row || isFinished(row.state)) return null;
        await ops.move(tx, row, JobState.Failed, { errorCode: code, message });
        return ops.ref(row);
      });
      if (ref) {
        await this.events.state(job.data.showId, {
          ...ref,
          state: JobState.Failed,
          errorCode: code,
          errorMessage: message,
        });
      }
    } catch (err) {
      this.logger.warn(`could not record the failure of job ${jobId}: ${(err as Error).message}`);
    }
  }
}
