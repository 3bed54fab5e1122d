import { Module } from '@nestjs/common';
import { ShotsController } from './shots.controller';
import { ShotsService } from './shots.service';
import { TrackingService } from './tracking.service';

/** Shots and tracking: counts, lateness, throughput, CSV export, render state. */
@Module({
  controllers: [ShotsController],
  providers: [ShotsService, TrackingService],
  exports: [ShotsService],
})
export class ShotsModule {}
