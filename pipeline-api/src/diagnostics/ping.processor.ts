import { hostname } from 'node:os';
import { OnApplicationBootstrap } from '@nestjs/common';
import { Processor, WorkerHost } from '@nestjs/bullmq';
import { Env } from '../config/env.validation';
import type { PingJob, PingResult } from './ping-job';
import { QUEUES } from '../queues/queue-names';

const STEP_MS = 100;

/** Answers diagnostic pings in the worker process, reporting progress at each step. */
@Processor(QUEUES.diagnostics)
export class PingProcessor extends WorkerHost implements OnApplicationBootstrap {
  constructor(private readonly env: Env) {
    super();
  }

  onApplicationBootstrap(): void {
    // Jobs this worker process runs at once (WORKER_CONCURRENCY).
    this.worker.concurrency = this.env.WORKER_CONCURRENCY;
  }

  async process(job: PingJob): Promise<PingResult> {
    const { steps } = job.data;
    for (let i = 1; i <= steps; i++) {
      await new Promise((r) => setTimeout(r, STEP_MS));
      await job.updateProgress({
        stage: `step ${i} of ${steps}`,
        percent: Math.round((100 * i) / steps),
      });
    }
    return { worker: `${hostname()}:${process.pid}`, steps, finishedAt: new Date().toISOString() };
  }
}
