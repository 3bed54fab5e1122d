import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { revokeSessionsOf } from '../auth/sessions.service';
import { Membership } from '../shows/entities/membership.entity';
import { User } from './entities/user.entity';
import { Role } from './entities/role';
import { userView, type AdminUserView } from './user-view';

/** A change an admin makes to a user. */
export interface UserChange {
  role?: Role;
  disabled?: boolean;
}

/** Admin work on users: list, change role, disable and enable. */
@Injectable()
export class AdminUsersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** Every user with the shows they belong to. */
  async list(): Promise<AdminUserView[]> {
    const users = await this.em.find(User, {}, { orderBy: { email: 'asc' } });
    const memberships = await this.em.find(Membership, {}, { fields: ['user', 'show'] });
    const shows = new Map<string, string[]>();
    for (const m of memberships) shows.set(m.user.id, [...(shows.get(m.user.id) ?? []), m.show.id]);
    return users.map((u) => ({ ...userView(u), showIds: shows.get(u.id) ?? [] }));
  }

  /** Changes a user's role and/or disables or enables them; a disabled user loses every session. */
  async change(
    actor: Principal,
    userId: string,
    change: UserChange,
    ip: string,
  ): Promise<AdminUserView> {
    const user = await this.em.findOne(User, { id: userId });
    if (!user)
      throw new DomainError('not_found', 'USER_NOT_FOUND', `No user ${userId}.`, { userId });
    const losesAdmin =
      user.role === Role.Admin &&
      !user.disabledAt &&
      ((change.role !== undefined && change.role !== Role.Admin) || change.disabled === true);
    if (losesAdmin) {
      const others = await this.em.count(User, {
        role: Role.Admin,
        disabledAt: null,
        id: { $ne: user.id },
      });
      if (others === 0) {
        throw new DomainError(
          'conflict',
          'LAST_ADMIN',
          'The last active admin cannot be demoted or disabled; make another admin first.',
        );
      }
    }
    const event = { objectType: 'user', objectId: user.id, ip };
    if (change.role !== undefined && change.role !== user.role) {
      this.audit.add(this.em, actor, {
        ...event,
        action: 'user.role_changed',
        details: { from: user.role, to: change.role },
      });
      user.role = change.role;
    }
    let revoke = false;
    if (change.disabled === true && !user.disabledAt) {
      user.disabledAt = new Date();
      revoke = true;
      this.audit.add(this.em, actor, { ...event, action: 'user.disabled' });
    } else if (change.disabled === false && user.disabledAt) {
      user.disabledAt = null;
      this.audit.add(this.em, actor, { ...event, action: 'user.enabled' });
    }
    await this.em.flush();
    if (revoke) await revokeSessionsOf(this.em, user.id);
    const showIds = (await this.em.find(Membership, { user }, { fields: ['show'] })).map(
      (m) => m.show.id,
    );
    return { ...userView(user), showIds };
  }
}
