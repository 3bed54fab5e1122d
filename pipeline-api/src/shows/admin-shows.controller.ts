import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  Patch,
  Post,
  Query,
  Req,
} from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { clientIp, type AuthedRequest, type UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { ShowsService } from './shows.service';
import { MembershipsService } from './memberships.service';
import type { ShowView } from './show-view';
import { CreateShowDto } from './dto/create-show.dto';
import { UpdateShowDto } from './dto/update-show.dto';
import { AddMemberDto } from './dto/add-member.dto';
import { ListShowsQuery } from './dto/list-shows.query';

/** Admin: shows and their memberships. */
@ApiTags('admin')
@Allow(Role.Admin)
@Controller('admin/shows')
export class AdminShowsController {
  constructor(
    private readonly shows: ShowsService,
    private readonly memberships: MembershipsService,
  ) {}

  /** Every show. */
  @Get()
  @ApiOperation({ summary: 'List every show' })
  @ApiErrors('VALIDATION_FAILED')
  list(@CurrentUser() actor: UserPrincipal, @Query() query: ListShowsQuery): Promise<ShowView[]> {
    return this.shows.listVisible(actor, query.archived ?? false);
  }

  /** Creates a show. */
  @Post()
  @ApiOperation({ summary: 'Create a show' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_CODE_TAKEN')
  create(
    @CurrentUser() actor: UserPrincipal,
    @Body() body: CreateShowDto,
    @Req() req: AuthedRequest,
  ): Promise<ShowView> {
    return this.shows.create(actor, body.code, body.name, clientIp(req));
  }

  /** Renames, archives or restores a show. */
  @Patch(':showId')
  @ApiOperation({ summary: 'Rename, archive or restore a show' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  update(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Body() body: UpdateShowDto,
    @Req() req: AuthedRequest,
  ): Promise<ShowView> {
    return this.shows.update(actor, showId, body, clientIp(req));
  }

  /** Adds a user to the show. */
  @Post(':showId/members')
  @HttpCode(204)
  @ApiOperation({ summary: 'Add a member' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND', 'USER_NOT_FOUND', 'MEMBERSHIP_EXISTS')
  async addMember(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Body() body: AddMemberDto,
    @Req() req: AuthedRequest,
  ): Promise<void> {
    await this.memberships.add(actor, showId, body.userId, clientIp(req));
  }

  /** Removes a user from the show. */
  @Delete(':showId/members/:userId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a member' })
  @ApiErrors('SHOW_NOT_FOUND', 'MEMBERSHIP_NOT_FOUND')
  async removeMember(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('userId') userId: string,
    @Req() req: AuthedRequest,
  ): Promise<void> {
    await this.memberships.remove(actor, showId, userId, clientIp(req));
  }
}
