import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { AuthedRequest, Principal } from '../../auth/principal';
import { DomainError } from '../errors/domain-error';

/** The principal the access guard let through: a signed-in user or a pipeline token. */
export const CurrentPrincipal = createParamDecorator(
  (_: unknown, ctx: ExecutionContext): Principal => {
    const principal = ctx.switchToHttp().getRequest<AuthedRequest>().principal;
    if (!principal)
      throw new DomainError('unauthenticated', 'NOT_SIGNED_IN', 'Sign in to use this route.');
    return principal;
  },
);

/** The signed-in user's principal, on routes only people may call (tokens get 403). */
export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext) => {
  const principal = ctx.switchToHttp().getRequest<AuthedRequest>().principal;
  if (!principal)
    throw new DomainError('unauthenticated', 'NOT_SIGNED_IN', 'Sign in to use this route.');
  if (principal.kind !== 'user') {
    throw new DomainError(
      'forbidden',
      'TOKEN_NOT_ALLOWED',
      'Pipeline tokens may not use this route.',
    );
  }
  return principal;
});
