import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal } from '../common/decorators/current-user.decorator';
import type { Principal } from '../auth/principal';
import { ShowsService, type MemberView } from './shows.service';
import type { ShowView } from './show-view';
import { ListShowsQuery } from './dto/list-shows.query';

/** Shows as their members (and their pipeline tokens) see them. */
@ApiTags('shows')
@Controller('shows')
export class ShowsController {
  constructor(private readonly shows: ShowsService) {}

  /** The caller's shows (admins: every show; a token: its own show). */
  @Get()
  @Allow(...ANY_ROLE)
  @AllowToken()
  @ApiOperation({ summary: "List the caller's shows" })
  @ApiErrors('VALIDATION_FAILED')
  list(
    @CurrentPrincipal() principal: Principal,
    @Query() query: ListShowsQuery,
  ): Promise<ShowView[]> {
    return this.shows.listVisible(principal, query.archived ?? false);
  }

  /** One show the caller belongs to. */
  @Get(':showId')
  @Allow(...ANY_ROLE)
  @AllowToken()
  @ApiOperation({ summary: 'Get a show' })
  @ApiErrors('SHOW_NOT_FOUND')
  get(
    @CurrentPrincipal() principal: Principal,
    @Param('showId') showId: string,
  ): Promise<ShowView> {
    return this.shows.getVisible(principal, showId);
  }

  /** The people of a show, e.g. to choose assignees. */
  @Get(':showId/members')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: "List a show's members" })
  @ApiErrors('SHOW_NOT_FOUND')
  members(@Param('showId') showId: string): Promise<MemberView[]> {
    return this.shows.members(showId);
  }
}
