import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { DomainError } from '../errors/domain-error';
import { IS_PUBLIC } from '../decorators/public.decorator';

/** Denies every route unless a rule allows it. Sign-in and roles add their rules here. */
@Injectable()
export class AccessGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (isPublic) return true;
    throw new DomainError('unauthenticated', 'NOT_SIGNED_IN', 'Sign in to use this route.');
  }
}
