import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { StorageModule } from '../storage/storage.module';
import { JobEventsPublisherModule } from '../events/job-events-publisher.module';
import { LibraryController } from './library.controller';
import { CapturesController } from './captures.controller';
import { ProfilesController } from './profiles.controller';
import { LibraryService } from './library.service';
import { CapturesService } from './captures.service';
import { ProfilesService } from './profiles.service';

/** The show's library: characters, captures (with consent), clips, profiles and their learning. */
@Module({
  imports: [
    StorageModule,
    JobEventsPublisherModule,
    BullModule.registerQueue({ name: QUEUES.learn }),
  ],
  controllers: [LibraryController, CapturesController, ProfilesController],
  providers: [LibraryService, CapturesService, ProfilesService],
  exports: [CapturesService],
})
export class LibraryModule {}
