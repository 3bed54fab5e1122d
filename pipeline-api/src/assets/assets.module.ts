import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { StorageModule } from '../storage/storage.module';
import { UploadsController } from './uploads.controller';
import { AssetsController } from './assets.controller';
import { UploadsService } from './uploads.service';
import { AssetsService } from './assets.service';

/** API side of uploads: presigned multipart uploads, the ingest queue, upload reports. */
@Module({
  imports: [BullModule.registerQueue({ name: QUEUES.ingest }), StorageModule],
  controllers: [UploadsController, AssetsController],
  providers: [UploadsService, AssetsService],
})
export class AssetsModule {}
