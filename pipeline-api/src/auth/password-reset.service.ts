import { Injectable, Logger } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';
import { hashSecret, newSecret } from '../common/crypto/secret-token';
import { AuditService } from '../audit/audit.service';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { User } from '../users/entities/user.entity';
import { hashPassword } from '../users/users.service';
import { passwordResetMail } from '../users/account-mail';
import { PasswordReset } from './entities/password-reset.entity';
import { revokeSessionsOf } from './sessions.service';

/** How long a reset link works. */
export const RESET_TTL_MS = 3_600_000;

const linkInvalid = () =>
  new DomainError(
    'invalid',
    'LINK_INVALID',
    'This reset link is unknown, already used or expired; ask for a new one.',
  );

/** Password reset by an e-mailed single-use link. */
@Injectable()
export class PasswordResetService {
  private readonly logger = new Logger('PasswordReset');

  constructor(
    private readonly em: EntityManager,
    private readonly env: Env,
    private readonly audit: AuditService,
    private readonly mail: MailOutboxService,
  ) {}

  /** E-mails a reset link when the address belongs to an enabled user; says nothing either way. */
  async request(email: string, ip: string): Promise<void> {
    const user = await this.em.findOne(User, {
      email: User.normaliseEmail(email),
      disabledAt: null,
    });
    if (!user) return;
    const secret = newSecret();
    const reset = new PasswordReset(user, hashSecret(secret), new Date(Date.now() + RESET_TTL_MS));
    this.em.persist(reset);
    this.audit.add(this.em, undefined, {
      action: 'auth.password_reset_requested',
      objectType: 'user',
      objectId: user.id,
      actorLabel: user.email,
      ip,
    });
    try {
      await this.mail.send(this.em, passwordResetMail(this.env.PUBLIC_URL, user.email, secret));
    } catch (e) {
      // The answer must not differ for known addresses; the record says the e-mail failed.
      this.logger.error(`reset e-mail for user ${user.id} not queued: ${(e as Error).message}`);
    }
  }

  /** Sets a new password with a link's secret; the link, and every session, stop working. */
  async confirm(secret: string, password: string, ip: string): Promise<void> {
    const reset = await this.em.findOne(
      PasswordReset,
      { tokenHash: hashSecret(secret) },
      { populate: ['user'] },
    );
    const now = new Date();
    if (!reset || reset.usedAt || reset.expiresAt <= now || reset.user.disabledAt)
      throw linkInvalid();
    const passwordHash = await hashPassword(password);
    await this.em.transactional(async (em) => {
      // Single use even when two requests race: only one of them updates the row.
      const claimed = await em.nativeUpdate(
        PasswordReset,
        { id: reset.id, usedAt: null },
        { usedAt: now },
      );
      if (claimed !== 1) throw linkInvalid();
      await em.nativeUpdate(PasswordReset, { user: reset.user.id, usedAt: null }, { usedAt: now });
      await em.nativeUpdate(User, { id: reset.user.id }, { passwordHash, updatedAt: now });
      await revokeSessionsOf(em, reset.user.id);
      this.audit.add(em, undefined, {
        action: 'auth.password_reset',
        objectType: 'user',
        objectId: reset.user.id,
        actorLabel: reset.user.email,
        ip,
      });
    });
  }
}
