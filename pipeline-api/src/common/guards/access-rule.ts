import type { Principal } from '../../auth/principal';
import { Role } from '../../users/entities/role';
import { DomainError } from '../errors/domain-error';
import type { TokenRequirement } from '../decorators/access.decorators';

/** What a route's decorators allow. */
export interface RouteRule {
  isPublic: boolean;
  roles?: readonly Role[];
  token?: TokenRequirement;
}

/** Throws the 403 that says why `principal` may not call a route with `rule`; returns if it may. */
export function checkRule(rule: RouteRule, principal: Principal): void {
  if (!rule.roles && !rule.token) {
    throw new DomainError('forbidden', 'NO_ACCESS_RULE', 'No rule allows this route.');
  }
  if (principal.kind === 'user') {
    const role = principal.user.role;
    if (role === Role.Admin || rule.roles?.includes(role)) return;
    throw new DomainError(
      'forbidden',
      'ROLE_NOT_ALLOWED',
      `The role ${role} may not use this route.`,
      { role },
    );
  }
  if (!rule.token) {
    throw new DomainError(
      'forbidden',
      'TOKEN_NOT_ALLOWED',
      'Pipeline tokens may not use this route.',
    );
  }
  if (rule.token !== 'any' && !principal.scopes.includes(rule.token)) {
    throw new DomainError(
      'forbidden',
      'TOKEN_SCOPE_MISSING',
      `This route needs a token with the scope ${rule.token}.`,
      { scope: rule.token },
    );
  }
}
