import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { StorageModule } from '../storage/storage.module';
import { JobEventsPublisherModule } from '../events/job-events-publisher.module';
import { LibraryModule } from '../library/library.module';
import { TakesModule } from '../takes/takes.module';
import { LearnRunner } from './solve/learn-runner';
import { RetargetRunner } from './solve/retarget-runner';
import { SolveWorkers } from './solve/solve-workers';

/**
 * Worker side of learn and retarget jobs. It imports what its jobs use (storage, live events,
 * the capture check, takes) so that on shutdown it is torn down before them and a running job
 * can still finish or be handed back.
 */
@Module({
  imports: [
    BullModule.registerQueue({ name: QUEUES.learn }, { name: QUEUES.retarget }),
    StorageModule,
    JobEventsPublisherModule,
    LibraryModule,
    TakesModule,
  ],
  providers: [LearnRunner, RetargetRunner, SolveWorkers],
})
export class JobsWorkerModule {}
