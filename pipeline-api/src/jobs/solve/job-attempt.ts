import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import type { EntityManager, MikroORM } from '@mikro-orm/core';
import type { JobEventsPublisher } from '../../events/job-events-publisher';
import type { JobRef, JobStateEvent } from '../../events/show-event';
import { JobState } from '../job-state';
import { withLockedJob, type AnyJob, type JobKindOps } from '../job-kinds';
import { JobCanceled, JobTakenOver } from './solve-failures';

const NO_ERROR = { errorCode: null, errorMessage: null };

/**
 * One attempt of a worker at a job. Every step locks the job row and checks that this attempt
 * still owns it (state solving, `worker` its own id): a job canceled through the API stops at its
 * next stage, and an attempt whose lock BullMQ gave to another worker touches nothing. The row is
 * the record polling routes read; each change is also published as a live event.
 */
export class JobAttempt<J extends AnyJob> {
  /** Host, process and a per-attempt suffix, stored on the row while this attempt owns it. */
  readonly worker = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`.slice(-120);
  private lastStage = '';
  private lastPercent = -1;

  constructor(
    private readonly orm: MikroORM,
    private readonly events: JobEventsPublisher,
    private readonly ops: JobKindOps<J>,
    readonly jobId: string,
    readonly showId: string,
    /** Aborts when the worker shuts down and hands the job back. */
    readonly released: AbortSignal,
  ) {}

  /**
   * Takes the job: queued → solving. A row still solving belongs to an attempt whose worker died
   * (BullMQ found it stalled), so it goes solving → queued → solving. False when there is
   * nothing to run: no such row, or already solved, failed or canceled.
   */
  async start(): Promise<boolean> {
    const states: JobStateEvent[] = [];
    const taken = await withLockedJob(this.orm, this.ops, this.jobId, async (tx, job) => {
      if (!job) return false;
      if (job.state === JobState.Solving) {
        const message = `Its worker (${job.worker ?? 'unknown'}) stopped; it runs again.`;
        await this.ops.move(tx, job, JobState.Queued, { message });
        states.push({ ...this.ops.ref(job), state: JobState.Queued, errorMessage: message });
      }
      if (job.state !== JobState.Queued) return false;
      await this.ops.move(tx, job, JobState.Solving, { worker: this.worker });
      job.stage = 'starting';
      states.push({ ...this.ops.ref(job), state: JobState.Solving, ...NO_ERROR });
      return true;
    });
    for (const e of states) await this.events.state(this.showId, e);
    return taken;
  }

  /** Records the stage and percent (0–99) and publishes them; throws when canceled or lost. */
  async progress(stage: string, percent: number): Promise<void> {
    this.assertRunning();
    const p = Math.max(0, Math.min(99, Math.round(percent)));
    // A stage change always counts; within a stage, steps of at least 2 %.
    if (stage === this.lastStage && p < this.lastPercent + 2) return;
    const ref = await withLockedJob(this.orm, this.ops, this.jobId, async (_tx, job) => {
      const owned = this.owned(job);
      owned.stage = stage;
      owned.percent = p;
      return this.ops.ref(owned);
    });
    this.lastStage = stage;
    this.lastPercent = p;
    await this.events.progress(this.showId, { ...ref, stage, percent: p });
  }

  /** Between stages: throws when the job was canceled, lost, or the worker is shutting down. */
  async check(): Promise<void> {
    this.assertRunning();
    await withLockedJob(this.orm, this.ops, this.jobId, async (_tx, job) => this.owned(job));
  }

  /**
   * Marks the job solved in one transaction with `record` (which stores the result), so a result
   * exists exactly when the job is solved; throws when the job was canceled or lost first.
   */
  async finish<R>(record: (tx: EntityManager, job: J) => Promise<R>): Promise<R> {
    const { result, ref } = await withLockedJob(this.orm, this.ops, this.jobId, async (tx, job) => {
      const owned = this.owned(job);
      const result = await record(tx, owned);
      await this.ops.move(tx, owned, JobState.Solved);
      return { result, ref: this.ops.ref(owned) };
    });
    await this.events.state(this.showId, { ...ref, state: JobState.Solved, ...NO_ERROR });
    return result;
  }

  /** Ends the job failed with a stable code and what to do (if this attempt still owns it). */
  async fail(errorCode: string, message: string): Promise<void> {
    await this.leave(JobState.Failed, { errorCode, message });
  }

  /** Sends the job back to queued, to run again (a retried fault, or a worker shutting down). */
  async requeue(message: string): Promise<void> {
    await this.leave(JobState.Queued, { message });
  }

  private async leave(
    to: JobState.Failed | JobState.Queued,
    info: { errorCode?: string; message: string },
  ): Promise<void> {
    const ref = await withLockedJob(this.orm, this.ops, this.jobId, async (tx, job) => {
      if (!job || job.state !== JobState.Solving || job.worker !== this.worker) return null;
      await this.ops.move(tx, job, to, info);
      return this.ops.ref(job);
    });
    if (!ref) return;
    const failed = to === JobState.Failed;
    await this.events.state(this.showId, {
      ...(ref as JobRef),
      state: to,
      errorCode: failed ? (info.errorCode ?? null) : null,
      errorMessage: info.message,
    });
  }

  private assertRunning(): void {
    if (this.released.aborted) throw this.released.reason;
  }

  /** The row if this attempt owns it; else why it stops. */
  private owned(job: J | null): J {
    if (!job || job.state === JobState.Canceled) throw new JobCanceled();
    if (job.state !== JobState.Solving || job.worker !== this.worker) throw new JobTakenOver();
    return job;
  }
}
