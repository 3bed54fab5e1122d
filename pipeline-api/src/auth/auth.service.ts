import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { verify } from '@node-rs/argon2';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import { User } from '../users/entities/user.entity';
import { hashPassword } from '../users/users.service';
import { SessionsService } from './sessions.service';
import { SignInThrottle } from './sign-in-throttle.service';
import type { Session } from './entities/session.entity';

/** Where a sign-in comes from. */
export interface ClientMeta {
  ip: string;
  userAgent?: string;
}

/** E-mail and password sign-in, throttled per address and per e-mail. */
@Injectable()
export class AuthService {
  // Verified against when the e-mail is unknown, so both answers take as long.
  private decoy?: Promise<string>;

  constructor(
    private readonly em: EntityManager,
    private readonly sessions: SessionsService,
    private readonly throttle: SignInThrottle,
    private readonly audit: AuditService,
  ) {}

  /** Checks the password and opens a session; returns the user and the cookie secret. */
  async signIn(
    email: string,
    password: string,
    meta: ClientMeta,
  ): Promise<{ user: User; secret: string; session: Session }> {
    const address = User.normaliseEmail(email);
    await this.throttle.assertAllowed(address, meta.ip);
    const user = await this.em.findOne(User, { email: address });
    this.decoy ??= hashPassword('decoy password that never matches');
    const ok = await verify(user?.passwordHash ?? (await this.decoy), password);
    if (!user || !ok) {
      await this.throttle.recordFailure(address, meta.ip);
      this.recordFailure(address, meta.ip, user ? 'wrong_password' : 'unknown_email', user?.id);
      await this.em.flush();
      throw new DomainError('unauthenticated', 'INVALID_CREDENTIALS', 'Wrong e-mail or password.');
    }
    if (user.disabledAt) {
      this.recordFailure(address, meta.ip, 'disabled', user.id);
      await this.em.flush();
      throw new DomainError(
        'forbidden',
        'ACCOUNT_DISABLED',
        'This account is disabled; ask an admin to enable it.',
      );
    }
    await this.throttle.clear(address);
    const { secret, session } = await this.sessions.create(user, meta);
    return { user, secret, session };
  }

  private recordFailure(email: string, ip: string, reason: string, userId?: string): void {
    this.audit.add(this.em, undefined, {
      action: 'auth.sign_in_failed',
      objectType: userId ? 'user' : undefined,
      objectId: userId,
      actorLabel: email,
      details: { reason },
      ip,
    });
  }
}
