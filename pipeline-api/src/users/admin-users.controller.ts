import { Body, Controller, Get, Param, Patch, Post, Req } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { clientIp, type AuthedRequest, type UserPrincipal } from '../auth/principal';
import { Role } from './entities/role';
import { AdminUsersService } from './admin-users.service';
import { InvitationsService, type InvitationView } from './invitations.service';
import type { AdminUserView } from './user-view';
import { ChangeUserDto } from './dto/change-user.dto';
import { InviteUserDto } from './dto/invite-user.dto';

/** Admin: users and invitations. */
@ApiTags('admin')
@Allow(Role.Admin)
@Controller('admin')
export class AdminUsersController {
  constructor(
    private readonly users: AdminUsersService,
    private readonly invitations: InvitationsService,
  ) {}

  /** Every user with role, state and shows. */
  @Get('users')
  @ApiOperation({ summary: 'List users' })
  list(): Promise<AdminUserView[]> {
    return this.users.list();
  }

  /** Changes a user's role, or disables / enables them. */
  @Patch('users/:userId')
  @ApiOperation({ summary: 'Change a user: role, disabled' })
  @ApiErrors('VALIDATION_FAILED', 'USER_NOT_FOUND', 'LAST_ADMIN')
  change(
    @CurrentUser() actor: UserPrincipal,
    @Param('userId') userId: string,
    @Body() body: ChangeUserDto,
    @Req() req: AuthedRequest,
  ): Promise<AdminUserView> {
    return this.users.change(actor, userId, body, clientIp(req));
  }

  /** Invites someone by e-mail with a role and shows. */
  @Post('invitations')
  @ApiOperation({ summary: 'Invite a user by e-mail' })
  @ApiErrors('VALIDATION_FAILED', 'USER_EXISTS', 'SHOW_NOT_FOUND', 'MAIL_UNAVAILABLE')
  invite(
    @CurrentUser() actor: UserPrincipal,
    @Body() body: InviteUserDto,
    @Req() req: AuthedRequest,
  ): Promise<InvitationView> {
    return this.invitations.invite(actor, body, clientIp(req));
  }

  /** Invitations not yet accepted or expired. */
  @Get('invitations')
  @ApiOperation({ summary: 'List open invitations' })
  listInvitations(): Promise<InvitationView[]> {
    return this.invitations.listOpen();
  }
}
