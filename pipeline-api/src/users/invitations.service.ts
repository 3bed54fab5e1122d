import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';
import { hashSecret, newSecret } from '../common/crypto/secret-token';
import { AuditService } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { Show } from '../shows/entities/show.entity';
import { Membership } from '../shows/entities/membership.entity';
import { Invitation } from './entities/invitation.entity';
import { User } from './entities/user.entity';
import type { Role } from './entities/role';
import { hashPassword } from './users.service';
import { invitationMail } from './account-mail';

/** How long an invitation link works. */
export const INVITATION_TTL_MS = 7 * 24 * 3_600_000;

/** An invitation as the API shows it (never its secret). */
export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  shows: { id: string; code: string; name: string }[];
  createdAt: string;
  expiresAt: string;
}

const linkInvalid = () =>
  new DomainError(
    'invalid',
    'LINK_INVALID',
    'This invitation link is unknown, already used, replaced by a newer one, or expired; ask an admin for a new one.',
  );

/** Admin invitations by e-mail; accepting one creates the user with their role and shows. */
@Injectable()
export class InvitationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly env: Env,
    private readonly audit: AuditService,
    private readonly mail: MailOutboxService,
  ) {}

  /** Invites an address with a role and shows, replacing any open invitation to it. */
  async invite(
    actor: Principal & { kind: 'user' },
    input: { email: string; role: Role; showIds: string[] },
    ip: string,
  ): Promise<InvitationView> {
    const email = User.normaliseEmail(input.email);
    if (await this.em.count(User, { email })) {
      throw new DomainError('conflict', 'USER_EXISTS', `A user with the address ${email} exists.`, {
        email,
      });
    }
    const showIds = [...new Set(input.showIds)];
    const shows = showIds.length ? await this.em.find(Show, { id: { $in: showIds } }) : [];
    const missing = showIds.filter((id) => !shows.some((s) => s.id === id));
    if (missing.length) {
      throw new DomainError('not_found', 'SHOW_NOT_FOUND', `No show ${missing.join(', ')}.`, {
        showIds: missing,
      });
    }
    await this.em.nativeUpdate(
      Invitation,
      { email, acceptedAt: null, revokedAt: null },
      { revokedAt: new Date() },
    );
    const secret = newSecret();
    const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
    const invitation = new Invitation(
      email,
      input.role,
      showIds,
      hashSecret(secret),
      actor.user,
      expiresAt,
    );
    this.em.persist(invitation);
    this.audit.add(this.em, actor, {
      action: 'user.invited',
      objectType: 'invitation',
      objectId: invitation.id,
      details: { email, role: input.role, showIds },
      ip,
    });
    const names = shows.map((s) => s.name);
    await this.mail.send(
      this.em,
      invitationMail(this.env.PUBLIC_URL, email, input.role, names, secret, expiresAt),
    );
    return this.view(invitation, shows);
  }

  /** Invitations not yet accepted, replaced or expired, newest first. */
  async listOpen(): Promise<InvitationView[]> {
    const open = await this.em.find(
      Invitation,
      { acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } },
      { orderBy: { createdAt: 'desc' } },
    );
    const ids = [...new Set(open.flatMap((i) => i.showIds))];
    const shows = ids.length ? await this.em.find(Show, { id: { $in: ids } }) : [];
    return open.map((i) => this.view(i, shows));
  }

  /** What an open invitation offers, for the accept page. */
  async lookup(secret: string): Promise<InvitationView> {
    const invitation = await this.findOpen(secret);
    const shows = invitation.showIds.length
      ? await this.em.find(Show, { id: { $in: invitation.showIds } })
      : [];
    return this.view(invitation, shows);
  }

  /** Accepts an invitation once: creates the user and their memberships. */
  async accept(secret: string, displayName: string, password: string, ip: string): Promise<User> {
    const invitation = await this.findOpen(secret);
    const passwordHash = await hashPassword(password);
    return this.em.transactional(async (em) => {
      // Claim the invitation atomically: of two accepts racing, one updates the row.
      const claimed = await em.nativeUpdate(
        Invitation,
        { id: invitation.id, acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } },
        { acceptedAt: new Date() },
      );
      if (claimed !== 1) throw linkInvalid();
      if (await em.count(User, { email: invitation.email })) {
        throw new DomainError(
          'conflict',
          'USER_EXISTS',
          `A user with the address ${invitation.email} exists; sign in instead.`,
        );
      }
      const user = new User(invitation.email, displayName.trim(), passwordHash, invitation.role);
      em.persist(user);
      const shows = invitation.showIds.length
        ? await em.find(Show, { id: { $in: invitation.showIds } })
        : [];
      for (const show of shows) em.persist(new Membership(show, user));
      this.audit.add(em, undefined, {
        action: 'user.joined',
        objectType: 'user',
        objectId: user.id,
        actorLabel: user.email,
        details: { invitationId: invitation.id, role: user.role, showIds: shows.map((s) => s.id) },
        ip,
      });
      return user;
    });
  }

  private async findOpen(secret: string): Promise<Invitation> {
    const invitation = await this.em.findOne(Invitation, { tokenHash: hashSecret(secret) });
    if (!invitation || !invitation.isOpen(new Date())) throw linkInvalid();
    return invitation;
  }

  private view(i: Invitation, shows: Show[]): InvitationView {
    return {
      id: i.id,
      email: i.email,
      role: i.role,
      shows: shows
        .filter((s) => i.showIds.includes(s.id))
        .map((s) => ({ id: s.id, code: s.code, name: s.name })),
      createdAt: i.createdAt.toISOString(),
      expiresAt: i.expiresAt.toISOString(),
    };
  }
}
