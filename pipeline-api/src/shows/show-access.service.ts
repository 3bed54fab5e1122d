import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import type { FilterQuery } from '@mikro-orm/core';
import { DomainError } from '../common/errors/domain-error';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { Show } from './entities/show.entity';
import { SHOW_NOT_FOUND_MESSAGE } from './show-view';

/** The error for a show the caller cannot reach, identical whether it exists or not. */
export const showNotFound = (showId: string) =>
  new DomainError('not_found', 'SHOW_NOT_FOUND', SHOW_NOT_FOUND_MESSAGE(showId), { showId });

/**
 * The SQL condition on shows that limits a query to what the principal may see: every show for
 * admins, the member's shows, or a token's one show. Every show-scoped query starts from this.
 */
export function visibleShows(principal: Principal): FilterQuery<Show> {
  if (principal.kind === 'token') return { id: principal.showId };
  if (principal.user.role === Role.Admin) return {};
  return { memberships: { user: principal.user.id } };
}

/** Decides, in SQL, whether a principal may reach a show. */
@Injectable()
export class ShowAccessService {
  constructor(private readonly em: EntityManager) {}

  /** Throws SHOW_NOT_FOUND unless the show exists and the principal may see it. */
  async assertReachable(principal: Principal, showId: string): Promise<void> {
    const count = await this.em.count(Show, { $and: [{ id: showId }, visibleShows(principal)] });
    if (count === 0) throw showNotFound(showId);
  }
}
