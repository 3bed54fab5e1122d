import { Body, Controller, Get, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Env } from '../config/env.validation';
import { Public } from '../common/decorators/public.decorator';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal, CurrentUser } from '../common/decorators/current-user.decorator';
import { AuthService } from './auth.service';
import { SessionsService } from './sessions.service';
import { SESSION_COOKIE, sessionCookieOptions } from './session-cookie';
import { clientIp, type AuthedRequest, type Principal, type UserPrincipal } from './principal';
import { meView, type MeView } from './me-view';
import { SignInDto } from './dto/sign-in.dto';

/** Sign-in, sign-out and who am I. */
@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly sessions: SessionsService,
    private readonly env: Env,
  ) {}

  /** Checks e-mail and password and sets the session cookie. */
  @Public()
  @Post('sign-in')
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign in with e-mail and password (sets the session cookie)' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'INVALID_CREDENTIALS',
    'ACCOUNT_DISABLED',
    'SIGN_IN_THROTTLED',
    'SIGN_IN_UNAVAILABLE',
  )
  async signIn(
    @Body() body: SignInDto,
    @Req() req: AuthedRequest,
    @Res({ passthrough: true }) res: Response,
  ): Promise<MeView> {
    const { user, secret, session } = await this.auth.signIn(body.email, body.password, {
      ip: clientIp(req),
      userAgent: req.headers['user-agent'],
    });
    res.cookie(SESSION_COOKIE, secret, sessionCookieOptions(this.env));
    return meView({ kind: 'user', user, sessionId: session.id });
  }

  /** Ends this session and clears the cookie. */
  @Allow(...ANY_ROLE)
  @Post('sign-out')
  @HttpCode(204)
  @ApiOperation({ summary: 'Sign out (ends this session)' })
  async signOut(
    @CurrentUser() me: UserPrincipal,
    @Res({ passthrough: true }) res: Response,
  ): Promise<void> {
    await this.sessions.revoke(me.sessionId);
    const { maxAge: _maxAge, ...options } = sessionCookieOptions(this.env);
    res.clearCookie(SESSION_COOKIE, options);
  }

  /** The signed-in user, or the pipeline token making the call. */
  @Allow(...ANY_ROLE)
  @AllowToken()
  @Get('me')
  @ApiOperation({ summary: 'Who is calling' })
  me(@CurrentPrincipal() principal: Principal): MeView {
    return meView(principal);
  }
}
