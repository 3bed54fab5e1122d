import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { DomainError } from '../errors/domain-error';
import { IS_PUBLIC } from '../decorators/public.decorator';
import { ALLOWED_ROLES, TOKEN_SCOPE, type TokenRequirement } from '../decorators/access.decorators';
import { Authenticator } from '../../auth/authenticator.service';
import type { AuthedRequest } from '../../auth/principal';
import { ShowAccessService } from '../../shows/show-access.service';
import type { Role } from '../../users/entities/role';
import { checkRule, type RouteRule } from './access-rule';

/**
 * Denies every route unless a rule allows it. In order: public routes pass; otherwise the caller
 * must authenticate (401); a route with a `:showId` needs a show the caller may see (404, the
 * same as for a show that does not exist); then the caller's role or token scope must match the
 * route's rule (403). The principal is put on the request.
 */
@Injectable()
export class AccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly authenticator: Authenticator,
    private readonly showAccess: ShowAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    const rule: RouteRule = {
      isPublic: this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets) ?? false,
      roles: this.reflector.getAllAndOverride<Role[]>(ALLOWED_ROLES, targets),
      token: this.reflector.getAllAndOverride<TokenRequirement>(TOKEN_SCOPE, targets),
    };
    if (rule.isPublic) return true;
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    const principal = await this.authenticator.authenticate(req);
    if (!principal)
      throw new DomainError('unauthenticated', 'NOT_SIGNED_IN', 'Sign in to use this route.');
    req.principal = principal;
    const showId = req.params?.showId as string | undefined;
    if (showId !== undefined) await this.showAccess.assertReachable(principal, showId);
    checkRule(rule, principal);
    return true;
  }
}
