// Sessions this API process looked up in the last few seconds, so a browser that fires a burst of
// requests (a page of the shot list, its filters, the live events) costs one lookup, not one per
// request. Entries live CACHE_MS at most; signing out, and ending a user's sessions, drop them at
// once in this process. Another API process may accept a just-ended session for up to CACHE_MS
// more, and a changed role takes up to CACHE_MS to apply: the price of skipping a database round
// trip on every request.

/** How long a looked-up session is reused without asking the database. */
export const SESSION_CACHE_MS = 5_000;

/** Most entries kept; the oldest go first (a burst of sign-ins cannot grow memory unbounded). */
const MAX_ENTRIES = 10_000;

/** What a lookup found: the session's times and its user's row as the database gave it. */
export interface CachedSession {
  id: string;
  userId: string;
  /** Columns of `users`, for `em.map`. */
  userRow: Record<string, unknown>;
  lastSeenAt: Date;
  idleExpiresAt: Date;
  absoluteExpiresAt: Date;
}

/** Recent session lookups of this process, by the SHA-256 of the session secret. */
export class SessionCache {
  private readonly byHash = new Map<string, CachedSession & { fetchedAt: number }>();
  /** Moves on at every forget, so a lookup that raced a sign-out is not kept. */
  private generation = 0;

  constructor(private readonly ttlMs = SESSION_CACHE_MS) {}

  /** The entry for a secret's hash if it was fetched less than the time to live ago. */
  get(tokenHash: string, now = Date.now()): CachedSession | undefined {
    const entry = this.byHash.get(tokenHash);
    if (!entry) return undefined;
    if (now - entry.fetchedAt >= this.ttlMs) {
      this.byHash.delete(tokenHash);
      return undefined;
    }
    return entry;
  }

  /** Call before a lookup; pass the result to `set`. */
  begin(): number {
    return this.generation;
  }

  /** Keeps a fresh lookup, unless a session was forgotten since the lookup began. */
  set(tokenHash: string, session: CachedSession, begun: number, now = Date.now()): void {
    if (begun !== this.generation) return;
    this.byHash.delete(tokenHash);
    if (this.byHash.size >= MAX_ENTRIES) {
      const oldest = this.byHash.keys().next().value;
      if (oldest !== undefined) this.byHash.delete(oldest);
    }
    this.byHash.set(tokenHash, { ...session, fetchedAt: now });
  }

  /** Drops one session (signed out). */
  forgetSession(sessionId: string): void {
    this.generation += 1;
    for (const [hash, entry] of this.byHash) if (entry.id === sessionId) this.byHash.delete(hash);
  }

  /** Drops every session of a user (disabled, new password). */
  forgetUser(userId: string): void {
    this.generation += 1;
    for (const [hash, entry] of this.byHash) if (entry.userId === userId) this.byHash.delete(hash);
  }

  /** Number of entries (for tests). */
  get size(): number {
    return this.byHash.size;
  }
}

/**
 * The process's cache. Module-level because `revokeSessionsOf`, which other modules call with
 * their own EntityManager, must reach it too.
 */
export const sessionCache = new SessionCache();
