import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { JobEventsPublisherModule } from '../events/job-events-publisher.module';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';
import { RetargetSubmitService } from './retarget-submit.service';

/** API side of learn and retarget jobs: submit retargets, list, read, cancel. */
@Module({
  imports: [
    JobEventsPublisherModule,
    BullModule.registerQueue({ name: QUEUES.learn }, { name: QUEUES.retarget }),
  ],
  controllers: [JobsController],
  providers: [JobsService, RetargetSubmitService],
})
export class JobsModule {}
