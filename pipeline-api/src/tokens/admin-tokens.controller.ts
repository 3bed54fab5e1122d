import { Body, Controller, Delete, Get, HttpCode, Param, Post, Req } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { clientIp, type AuthedRequest, type UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { TokensService, type TokenView } from './tokens.service';
import { CreateTokenDto } from './dto/create-token.dto';

/** Admin: a show's pipeline tokens. */
@ApiTags('admin')
@Allow(Role.Admin)
@Controller('admin/shows/:showId/tokens')
export class AdminTokensController {
  constructor(private readonly tokens: TokensService) {}

  /** Creates a token; the answer's `secret` is shown this once. */
  @Post()
  @ApiOperation({ summary: 'Create a pipeline token (secret shown once)' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  create(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Body() body: CreateTokenDto,
    @Req() req: AuthedRequest,
  ): Promise<TokenView & { secret: string }> {
    return this.tokens.create(actor, showId, body.name, body.scopes, clientIp(req));
  }

  /** The show's tokens, without secrets. */
  @Get()
  @ApiOperation({ summary: "List a show's pipeline tokens" })
  @ApiErrors('SHOW_NOT_FOUND')
  list(@Param('showId') showId: string): Promise<TokenView[]> {
    return this.tokens.list(showId);
  }

  /** Revokes a token at once. */
  @Delete(':tokenId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Revoke a pipeline token' })
  @ApiErrors('SHOW_NOT_FOUND', 'TOKEN_NOT_FOUND')
  async revoke(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('tokenId') tokenId: string,
    @Req() req: AuthedRequest,
  ): Promise<void> {
    await this.tokens.revoke(actor, showId, tokenId, clientIp(req));
  }
}
