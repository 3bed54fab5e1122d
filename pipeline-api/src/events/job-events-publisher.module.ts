import { Module } from '@nestjs/common';
import { JobEventsPublisher } from './job-events-publisher';

/** The live-event publisher, for the worker's processors (and the API where it reports too). */
@Module({
  providers: [JobEventsPublisher],
  exports: [JobEventsPublisher],
})
export class JobEventsPublisherModule {}
