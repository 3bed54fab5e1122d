import { Injectable } from '@nestjs/common';
import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { Show } from './entities/show.entity';
import { Membership } from './entities/membership.entity';
import { showNotFound, visibleShows } from './show-access.service';
import { showView, type ShowView } from './show-view';

/** A member of a show as the show's people see them. */
export interface MemberView {
  userId: string;
  displayName: string;
  email: string;
  role: Role;
  disabled: boolean;
  since: string;
}

/** Shows: what each principal may see, and the admin's create / rename / archive. */
@Injectable()
export class ShowsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** The shows the principal may see (archived ones only when asked), by code. */
  async listVisible(principal: Principal, includeArchived = false): Promise<ShowView[]> {
    const where = includeArchived ? {} : { archivedAt: null };
    const shows = await this.em.find(
      Show,
      { $and: [visibleShows(principal), where] },
      { orderBy: { code: 'asc' } },
    );
    return shows.map(showView);
  }

  /** One show, if the principal may see it. */
  async getVisible(principal: Principal, showId: string): Promise<ShowView> {
    const show = await this.em.findOne(Show, { $and: [{ id: showId }, visibleShows(principal)] });
    if (!show) throw showNotFound(showId);
    return showView(show);
  }

  /** The people of a show (the caller's access to it is checked by the guard). */
  async members(showId: string): Promise<MemberView[]> {
    const rows = await this.em.find(
      Membership,
      { show: showId },
      { populate: ['user'], orderBy: { user: { displayName: 'asc' } } },
    );
    return rows.map((m) => ({
      userId: m.user.id,
      displayName: m.user.displayName,
      email: m.user.email,
      role: m.user.role,
      disabled: !!m.user.disabledAt,
      since: m.createdAt.toISOString(),
    }));
  }

  /** Creates a show; its code must be free. */
  async create(actor: Principal, code: string, name: string, ip: string): Promise<ShowView> {
    const show = new Show(code, name);
    this.em.persist(show);
    this.audit.add(this.em, actor, {
      action: 'show.created',
      objectType: 'show',
      objectId: show.id,
      showId: show.id,
      details: { code: show.code, name: show.name },
      ip,
    });
    try {
      await this.em.flush();
    } catch (e) {
      if (e instanceof UniqueConstraintViolationException) {
        throw new DomainError(
          'conflict',
          'SHOW_CODE_TAKEN',
          `Another show has the code ${show.code}.`,
          { code: show.code },
        );
      }
      throw e;
    }
    return showView(show);
  }

  /** Renames, archives or restores a show. */
  async update(
    actor: Principal,
    showId: string,
    change: { name?: string; archived?: boolean },
    ip: string,
  ): Promise<ShowView> {
    const show = await this.em.findOne(Show, { id: showId });
    if (!show) throw showNotFound(showId);
    const event = { objectType: 'show', objectId: show.id, showId: show.id, ip };
    if (change.name !== undefined && change.name.trim() !== show.name) {
      this.audit.add(this.em, actor, {
        ...event,
        action: 'show.renamed',
        details: { from: show.name, to: change.name.trim() },
      });
      show.name = change.name.trim();
    }
    if (change.archived === true && !show.archivedAt) {
      show.archivedAt = new Date();
      this.audit.add(this.em, actor, { ...event, action: 'show.archived' });
    } else if (change.archived === false && show.archivedAt) {
      show.archivedAt = null;
      this.audit.add(this.em, actor, { ...event, action: 'show.restored' });
    }
    await this.em.flush();
    return showView(show);
  }
}
