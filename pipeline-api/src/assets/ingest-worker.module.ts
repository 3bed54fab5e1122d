import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { StorageModule } from '../storage/storage.module';
import { JobEventsPublisherModule } from '../events/job-events-publisher.module';
import { IngestProcessor } from './ingest/ingest.processor';
import { IngestService } from './ingest/ingest.service';

/** Worker side of uploads: the ingest check. */
@Module({
  imports: [
    BullModule.registerQueue({ name: QUEUES.ingest }),
    StorageModule,
    JobEventsPublisherModule,
  ],
  providers: [IngestProcessor, IngestService],
})
export class IngestWorkerModule {}
