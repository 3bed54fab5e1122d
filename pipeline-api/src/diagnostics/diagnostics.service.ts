import { Injectable } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import type { Queue } from 'bullmq';
import { DomainError } from '../common/errors/domain-error';
import { QUEUES } from '../queues/queue-names';
import type { JobProgress, PingData, PingResult } from './ping-job';

/** A ping job as the API shows it. */
export interface PingView {
  id: string;
  state: string;
  progress: JobProgress;
  result?: PingResult;
  failedReason?: string;
}

/** Sends diagnostic pings through the worker queue and reads their state back. */
@Injectable()
export class DiagnosticsService {
  constructor(
    @InjectQueue(QUEUES.diagnostics) private readonly queue: Queue<PingData, PingResult, 'ping'>,
  ) {}

  /** Enqueues one ping. */
  async create(steps: number): Promise<PingView> {
    const job = await this.queue.add(
      'ping',
      { steps },
      { removeOnComplete: { age: 3600, count: 100 }, removeOnFail: { age: 86_400 } },
    );
    return { id: job.id as string, state: 'waiting', progress: { stage: 'queued', percent: 0 } };
  }

  /** Reads one ping's state, progress and result. */
  async get(id: string): Promise<PingView> {
    // State first, then the job: read the other way round, a job finishing in between would show
    // as completed without its result.
    const state = await this.queue.getJobState(id);
    const job = await this.queue.getJob(id);
    if (!job || state === 'unknown')
      throw new DomainError(
        'not_found',
        'PING_NOT_FOUND',
        `No diagnostic ping ${id}; it may have expired.`,
        { id },
      );
    const progress =
      typeof job.progress === 'object' && job.progress !== null
        ? (job.progress as unknown as JobProgress)
        : {
            stage: state === 'completed' ? 'done' : 'queued',
            percent: state === 'completed' ? 100 : 0,
          };
    const view: PingView = { id, state, progress };
    if (job.returnvalue) view.result = job.returnvalue;
    if (job.failedReason) view.failedReason = job.failedReason;
    return view;
  }
}
