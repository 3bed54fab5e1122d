import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { Env } from '../config/env.validation';
import { hashSecret, newSecret } from '../common/crypto/secret-token';
import { User } from '../users/entities/user.entity';
import { Session } from './entities/session.entity';
import { sessionCache, type CachedSession } from './session-cache';

/** Only write "last seen" this often, not on every request. */
const TOUCH_EVERY_MS = 60_000;

/**
 * The session lookup is one plain query with the user's row joined (ORM criteria and hydration of
 * both entities cost several times as much). The columns of `users` keep their names for
 * `em.map`; the session's own get a prefix.
 */
const LOOKUP_SQL =
  'select u.*, s.id as session__id, s.last_seen_at as session__last_seen_at, ' +
  's.idle_expires_at as session__idle_expires_at, s.absolute_expires_at as session__absolute_expires_at, ' +
  's.revoked_at as session__revoked_at from sessions s join users u on u.id = s.user_id where s.token_hash = ?';

/** A session that signs its user in: its id and the user (managed by the request's EntityManager). */
export interface LiveSession {
  id: string;
  user: User;
}

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

  /**
   * The live session of an enabled user for this secret, or null; moves the idle expiry on. A
   * lookup of the last few seconds is reused (see session-cache.ts); expiry is checked every time.
   */
  async resolve(secret: string): Promise<LiveSession | null> {
    const tokenHash = hashSecret(secret);
    const now = new Date();
    let found = sessionCache.get(tokenHash, now.getTime()) ?? null;
    if (!found) {
      const begun = sessionCache.begin();
      found = await this.lookup(tokenHash);
      if (!found || !isLive(found, now)) return null;
      if (now.getTime() - found.lastSeenAt.getTime() > TOUCH_EVERY_MS) {
        const idle = new Date(
          Math.min(now.getTime() + this.idleMs(), found.absoluteExpiresAt.getTime()),
        );
        await this.em.nativeUpdate(
          Session,
          { id: found.id },
          { lastSeenAt: now, idleExpiresAt: idle },
        );
        found = { ...found, lastSeenAt: now, idleExpiresAt: idle };
      }
      sessionCache.set(tokenHash, found, begun, now.getTime());
    }
    if (!isLive(found, now)) return null;
    return { id: found.id, user: this.em.map(User, { ...found.userRow }) };
  }

  /** The session of a secret's hash with its user's row, unless revoked or the user disabled. */
  private async lookup(tokenHash: string): Promise<CachedSession | null> {
    const rows: Record<string, unknown>[] = await this.em
      .getConnection()
      .execute(LOOKUP_SQL, [tokenHash]);
    if (rows.length === 0) return null;
    const userRow: Record<string, unknown> = {};
    const session: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(rows[0])) {
      if (key.startsWith('session__')) session[key.slice(9)] = value;
      else userRow[key] = value;
    }
    if (session.revoked_at != null || userRow.disabled_at != null) return null;
    const date = (v: unknown) => this.em.getPlatform().parseDate(v as string);
    return {
      id: session.id as string,
      userId: userRow.id as string,
      userRow,
      lastSeenAt: date(session.last_seen_at),
      idleExpiresAt: date(session.idle_expires_at),
      absoluteExpiresAt: date(session.absolute_expires_at),
    };
  }

  /** Ends one session. */
  async revoke(sessionId: string): Promise<void> {
    await this.em.nativeUpdate(
      Session,
      { id: sessionId, revokedAt: null },
      { revokedAt: new Date() },
    );
    sessionCache.forgetSession(sessionId);
  }

  private idleMs(): number {
    return this.env.SESSION_IDLE_MINUTES * 60_000;
  }
}

/** Ends every open session of a user (disabled account, new password). */
export async function revokeSessionsOf(em: EntityManager, userId: string): Promise<number> {
  const ended = await em.nativeUpdate(
    Session,
    { user: userId, revokedAt: null },
    { revokedAt: new Date() },
  );
  sessionCache.forgetUser(userId);
  return ended;
}

/** Whether a session's idle and absolute expiries are both still ahead of `now`. */
const isLive = (s: CachedSession, now: Date) => s.idleExpiresAt > now && s.absoluteExpiresAt > now;
