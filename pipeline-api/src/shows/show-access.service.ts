import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import type { FilterQuery } from '@mikro-orm/core';
import { DomainError } from '../common/errors/domain-error';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { Show } from './entities/show.entity';
import { SHOW_NOT_FOUND_MESSAGE } from './show-view';
import { ShowAccessCache } from './show-access-cache';

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

/** The cache key of a principal's check of a show (the role is part of it: admins see all). */
const accessKey = (principal: Principal, showId: string) =>
  principal.kind === 'token'
    ? `token:${principal.token.id}:${showId}`
    : `user:${principal.user.id}:${principal.user.role}:${showId}`;

/**
 * Decides, in SQL, whether a principal may reach a show — the same rule as `visibleShows`, as one
 * plain primary- or unique-key select — and reuses a passed check for a few seconds.
 */
@Injectable()
export class ShowAccessService {
  private readonly cache = new ShowAccessCache();

  constructor(private readonly em: EntityManager) {}

  /** Throws SHOW_NOT_FOUND unless the show exists and the principal may see it. */
  async assertReachable(principal: Principal, showId: string): Promise<void> {
    const key = accessKey(principal, showId);
    if (this.cache.has(key)) return;
    const begun = this.cache.begin();
    if (!(await this.reachable(principal, showId))) throw showNotFound(showId);
    this.cache.add(key, begun);
  }

  /** Forgets every passed check at once (call when a membership is removed). */
  forgetAll(): void {
    this.cache.forgetAll();
  }

  private async reachable(principal: Principal, showId: string): Promise<boolean> {
    if (principal.kind === 'token' && principal.showId !== showId) return false;
    const member = principal.kind === 'user' && principal.user.role !== Role.Admin;
    // A membership names an existing show (foreign key), so members need only that row.
    const [sql, params] = member
      ? [
          'select 1 from memberships where show_id = ? and user_id = ? limit 1',
          [showId, principal.user.id],
        ]
      : ['select 1 from shows where id = ? limit 1', [showId]];
    const rows: unknown[] = await this.em.getConnection().execute(sql, params);
    return rows.length > 0;
  }
}
