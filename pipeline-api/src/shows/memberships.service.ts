import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { User } from '../users/entities/user.entity';
import { Show } from './entities/show.entity';
import { Membership } from './entities/membership.entity';
import { ShowAccessService, showNotFound } from './show-access.service';

/** Adds people to shows and removes them (admin). */
@Injectable()
export class MembershipsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly showAccess: ShowAccessService,
  ) {}

  /** Makes a user a member of a show. */
  async add(actor: Principal, showId: string, userId: string, ip: string): Promise<void> {
    const show = await this.em.findOne(Show, { id: showId });
    if (!show) throw showNotFound(showId);
    const user = await this.em.findOne(User, { id: userId });
    if (!user)
      throw new DomainError('not_found', 'USER_NOT_FOUND', `No user ${userId}.`, { userId });
    if (await this.em.count(Membership, { show, user })) {
      throw new DomainError(
        'conflict',
        'MEMBERSHIP_EXISTS',
        `${user.email} is already a member of ${show.code}.`,
        { showId, userId },
      );
    }
    const membership = new Membership(show, user);
    this.em.persist(membership);
    this.audit.add(this.em, actor, {
      action: 'membership.added',
      objectType: 'user',
      objectId: user.id,
      showId,
      details: { email: user.email },
      ip,
    });
    await this.em.flush();
  }

  /** Removes a user from a show. */
  async remove(actor: Principal, showId: string, userId: string, ip: string): Promise<void> {
    const membership = await this.em.findOne(
      Membership,
      { show: showId, user: userId },
      { populate: ['user'] },
    );
    if (!membership) {
      throw new DomainError(
        'not_found',
        'MEMBERSHIP_NOT_FOUND',
        `User ${userId} is not a member of show ${showId}.`,
        { showId, userId },
      );
    }
    this.em.remove(membership);
    this.audit.add(this.em, actor, {
      action: 'membership.removed',
      objectType: 'user',
      objectId: userId,
      showId,
      details: { email: membership.user.email },
      ip,
    });
    await this.em.flush();
    // The member's next request in this process is checked again, not let in from the cache.
    this.showAccess.forgetAll();
  }
}
