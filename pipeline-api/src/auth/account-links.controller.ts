import { Body, Controller, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { Response } from 'express';
import { Env } from '../config/env.validation';
import { Public } from '../common/decorators/public.decorator';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { InvitationsService, type InvitationView } from '../users/invitations.service';
import { PasswordResetService } from './password-reset.service';
import { SessionsService } from './sessions.service';
import { SESSION_COOKIE, sessionCookieOptions } from './session-cookie';
import { clientIp, type AuthedRequest } from './principal';
import { meView, type MeView } from './me-view';
import {
  AcceptInvitationDto,
  ConfirmPasswordResetDto,
  LinkTokenDto,
  RequestPasswordResetDto,
} from './dto/account-links.dto';

// Links are guessable only by brute force of 256 bits, but these routes also send e-mail or hash
// passwords: keep their rate low per address.
const LINK_RATE = { default: { limit: 20, ttl: 60_000 } };

/** The routes behind e-mailed links: password reset and invitation acceptance. */
@ApiTags('auth')
@Public()
@Throttle(LINK_RATE)
@Controller('auth')
export class AccountLinksController {
  constructor(
    private readonly resets: PasswordResetService,
    private readonly invitations: InvitationsService,
    private readonly sessions: SessionsService,
    private readonly env: Env,
  ) {}

  /** E-mails a reset link; answers the same whether or not the address is known. */
  @Post('password-reset')
  @HttpCode(202)
  @ApiOperation({ summary: 'Ask for a password reset link by e-mail' })
  @ApiErrors('VALIDATION_FAILED', 'TOO_MANY_REQUESTS')
  async requestReset(
    @Body() body: RequestPasswordResetDto,
    @Req() req: AuthedRequest,
  ): Promise<{ message: string }> {
    await this.resets.request(body.email, clientIp(req));
    return { message: 'If this address belongs to an account, a reset link is on its way.' };
  }

  /** Sets a new password with the link's token; every session of the account ends. */
  @Post('password-reset/confirm')
  @HttpCode(204)
  @ApiOperation({ summary: 'Set a new password with a reset link' })
  @ApiErrors('VALIDATION_FAILED', 'LINK_INVALID', 'TOO_MANY_REQUESTS')
  async confirmReset(
    @Body() body: ConfirmPasswordResetDto,
    @Req() req: AuthedRequest,
  ): Promise<void> {
    await this.resets.confirm(body.token, body.password, clientIp(req));
  }

  /** What an invitation offers (e-mail, role, shows), for the accept page. */
  @Post('invitations/lookup')
  @HttpCode(200)
  @ApiOperation({ summary: 'Read an invitation by its link token' })
  @ApiErrors('VALIDATION_FAILED', 'LINK_INVALID', 'TOO_MANY_REQUESTS')
  lookup(@Body() body: LinkTokenDto): Promise<InvitationView> {
    return this.invitations.lookup(body.token);
  }

  /** Creates the account from an invitation and signs it in. */
  @Post('invitations/accept')
  @ApiOperation({ summary: 'Accept an invitation: choose a name and password' })
  @ApiErrors('VALIDATION_FAILED', 'LINK_INVALID', 'USER_EXISTS', 'TOO_MANY_REQUESTS')
  async accept(
    @Body() body: AcceptInvitationDto,
    @Req() req: AuthedRequest,
    @Res({ passthrough: true }) res: Response,
  ): Promise<MeView> {
    const ip = clientIp(req);
    const user = await this.invitations.accept(body.token, body.displayName, body.password, ip);
    const { secret, session } = await this.sessions.create(user, {
      ip,
      userAgent: req.headers['user-agent'],
    });
    res.cookie(SESSION_COOKIE, secret, sessionCookieOptions(this.env));
    return meView({ kind: 'user', user, sessionId: session.id });
  }
}
