import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { Env } from '../config/env.validation';
import { hashSecret, newSecret } from '../common/crypto/secret-token';
import type { User } from '../users/entities/user.entity';
import { Session } from './entities/session.entity';

/** Only write "last seen" this often, not on every request. */
const TOUCH_EVERY_MS = 60_000;

/** Server-side sessions: created at sign-in, looked up by the cookie's hash, revocable. */
@Injectable()
export class SessionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly env: Env,
  ) {}

  /** Opens a session for `user`; returns the secret for the cookie (never stored). */
  async create(
    user: User,
    meta: { ip?: string; userAgent?: string },
  ): Promise<{ secret: string; session: Session }> {
    const secret = newSecret();
    const now = Date.now();
    const absolute = new Date(now + this.env.SESSION_ABSOLUTE_HOURS * 3_600_000);
    const idle = new Date(Math.min(now + this.idleMs(), absolute.getTime()));
    const session = new Session(user, hashSecret(secret), idle, absolute);
    session.ip = meta.ip?.slice(0, 64);
    session.userAgent = meta.userAgent?.slice(0, 255);
    await this.em.persistAndFlush(session);
    return { secret, session };
  }

  /** The live session of an enabled user for this secret, or null; moves the idle expiry on. */
  async resolve(secret: string): Promise<Session | null> {
    const session = await this.em.findOne(
      Session,
      { tokenHash: hashSecret(secret) },
      { populate: ['user'] },
    );
    const now = new Date();
    if (!session || !session.isLive(now) || session.user.disabledAt) return null;
    if (now.getTime() - session.lastSeenAt.getTime() > TOUCH_EVERY_MS) {
      const idle = new Date(
        Math.min(now.getTime() + this.idleMs(), session.absoluteExpiresAt.getTime()),
      );
      await this.em.nativeUpdate(
        Session,
        { id: session.id },
        { lastSeenAt: now, idleExpiresAt: idle },
      );
    }
    return session;
  }

  /** Ends one session. */
  async revoke(sessionId: string): Promise<void> {
    await this.em.nativeUpdate(
      Session,
      { id: sessionId, revokedAt: null },
      { revokedAt: new Date() },
    );
  }

  private idleMs(): number {
    return this.env.SESSION_IDLE_MINUTES * 60_000;
  }
}

/** Ends every open session of a user (disabled account, new password). */
export async function revokeSessionsOf(em: EntityManager, userId: string): Promise<number> {
  return em.nativeUpdate(Session, { user: userId, revokedAt: null }, { revokedAt: new Date() });
}
