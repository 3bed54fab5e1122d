import { OnApplicationBootstrap } from '@nestjs/common';
import { Processor, WorkerHost } from '@nestjs/bullmq';
import { Env } from '../../config/env.validation';
import { QUEUES } from '../../queues/queue-names';
import { IngestService } from './ingest.service';
import type { IngestJob, IngestResult } from './ingest-job';

/** Runs the ingest check of each completed upload in the worker process. */
@Processor(QUEUES.ingest)
export class IngestProcessor extends WorkerHost implements OnApplicationBootstrap {
  constructor(
    private readonly env: Env,
    private readonly ingest: IngestService,
  ) {
    super();
  }

  onApplicationBootstrap(): void {
    this.worker.concurrency = this.env.WORKER_CONCURRENCY;
  }

  process(job: IngestJob): Promise<IngestResult> {
    const lastAttempt = job.attemptsMade + 1 >= (job.opts.attempts ?? 1);
    return this.ingest.check(
      job.data.assetId,
      (p) => job.updateProgress(p as unknown as object),
      lastAttempt,
    );
  }
}
