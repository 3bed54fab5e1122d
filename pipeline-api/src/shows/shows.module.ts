import { Module } from '@nestjs/common';
import { ShowsController } from './shows.controller';
import { AdminShowsController } from './admin-shows.controller';
import { ShowsService } from './shows.service';
import { ShowAccessService } from './show-access.service';
import { MembershipsService } from './memberships.service';

/** Shows and memberships; exports the membership check the access guard uses. */
@Module({
  controllers: [ShowsController, AdminShowsController],
  providers: [ShowsService, ShowAccessService, MembershipsService],
  exports: [ShowsService, ShowAccessService],
})
export class ShowsModule {}
