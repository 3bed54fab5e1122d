// Show checks this API process passed in the last few seconds, so a client paging through a show
// (the shot list, its filters, the job list) costs one membership lookup, not one per request.
// Only granted access is kept: someone just added to a show gets in at once. Removing a member
// drops every entry in this process at once; another API process may let the removed member in
// for up to SHOW_ACCESS_CACHE_MS more — the same bound as a cached session (auth/session-cache.ts).

/** How long a passed show check is reused without asking the database. */
export const SHOW_ACCESS_CACHE_MS = 5_000;

/** Most entries kept; the oldest go first. */
const MAX_ENTRIES = 10_000;

/** Recent show checks that passed, by principal and show. */
export class ShowAccessCache {
  private readonly passedAt = new Map<string, number>();
  /** Moves on at every forget, so a check that raced a removal is not kept. */
  private generation = 0;

  constructor(private readonly ttlMs = SHOW_ACCESS_CACHE_MS) {}

  /** True when the check of `key` passed less than the time to live ago. */
  has(key: string, now = Date.now()): boolean {
    const at = this.passedAt.get(key);
    if (at === undefined) return false;
    if (now - at < this.ttlMs) return true;
    this.passedAt.delete(key);
    return false;
  }

  /** Call before a check; pass the result to `add`. */
  begin(): number {
    return this.generation;
  }

  /** Keeps a passed check, unless access was taken away since the check began. */
  add(key: string, begun: number, now = Date.now()): void {
    if (begun !== this.generation) return;
    this.passedAt.delete(key);
    if (this.passedAt.size >= MAX_ENTRIES) {
      const oldest = this.passedAt.keys().next().value;
      if (oldest !== undefined) this.passedAt.delete(oldest);
    }
    this.passedAt.set(key, now);
  }

  /** Drops every entry (a membership was removed). */
  forgetAll(): void {
    this.generation += 1;
    this.passedAt.clear();
  }

  /** Number of entries (for tests). */
  get size(): number {
    return this.passedAt.size;
  }
}
