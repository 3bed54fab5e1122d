import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { ShowsModule } from '../shows/shows.module';
import { ShowEventsController } from './show-events.controller';
import { ShowEventsHub } from './show-events-hub';

/** API side of live events: the Redis subscription and the show event streams. */
@Module({
  imports: [AuthModule, ShowsModule],
  controllers: [ShowEventsController],
  providers: [ShowEventsHub],
})
export class EventsModule {}
