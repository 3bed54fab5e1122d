// Who may call a route. The global AccessGuard enforces these; a route with none is denied.
import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';
import { Role } from '../../users/entities/role';
import type { TokenScope } from '../../tokens/token-scope';
import { ApiErrors } from './api-errors.decorator';

export const ALLOWED_ROLES = 'overshoot:allowedRoles';
export const TOKEN_SCOPE = 'overshoot:tokenScope';

/** Every role: any signed-in person (admins are allowed everywhere anyway). */
export const ANY_ROLE: readonly Role[] = Object.values(Role);

/** What a pipeline token needs for a route: one scope, or `any` for every token of the show. */
export type TokenRequirement = TokenScope | 'any';

/** Lets signed-in people with one of these roles call the route; admins always may. */
export function Allow(...roles: Role[]) {
  if (roles.length === 0) throw new Error('@Allow() needs at least one role');
  const documented = [...new Set([Role.Admin, ...roles])];
  return applyDecorators(
    SetMetadata(ALLOWED_ROLES, roles),
    ApiExtension('x-roles', documented),
    ApiErrors('NOT_SIGNED_IN', 'TOKEN_INVALID', 'ROLE_NOT_ALLOWED', 'TOKEN_NOT_ALLOWED'),
  );
}

/** Lets a pipeline token with this scope (or any token, by default) call the route in its show. */
export function AllowToken(scope: TokenRequirement = 'any') {
  return applyDecorators(
    SetMetadata(TOKEN_SCOPE, scope),
    ApiExtension('x-token-scope', scope),
    ApiErrors('NOT_SIGNED_IN', 'TOKEN_INVALID', 'TOKEN_SCOPE_MISSING'),
  );
}
