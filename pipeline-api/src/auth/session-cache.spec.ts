import { describe, expect, it } from 'vitest';
import { SessionCache, type CachedSession } from './session-cache';

const entry = (id: string, userId = 'u1'): CachedSession => ({
  id,
  userId,
  userRow: { id: userId },
  lastSeenAt: new Date(0),
  idleExpiresAt: new Date(1e13),
  absoluteExpiresAt: new Date(1e13),
});

describe('SessionCache', () => {
  it('returns a lookup until its time to live has passed, then forgets it', () => {
    const cache = new SessionCache(5_000);
    cache.set('h1', entry('s1'), cache.begin(), 1_000);
    expect(cache.get('h1', 5_999)?.id).toBe('s1');
    expect(cache.get('h1', 6_000)).toBeUndefined();
    expect(cache.size).toBe(0);
  });

  it('forgets one session at sign-out and every session of a user at once', () => {
    const cache = new SessionCache();
    const t = Date.now();
    cache.set('h1', entry('s1', 'u1'), cache.begin(), t);
    cache.set('h2', entry('s2', 'u1'), cache.begin(), t);
    cache.set('h3', entry('s3', 'u2'), cache.begin(), t);
    cache.forgetSession('s3');
    expect(cache.get('h3', t)).toBeUndefined();
    expect(cache.get('h1', t)?.id).toBe('s1');
    cache.forgetUser('u1');
    expect(cache.size).toBe(0);
  });

  it('does not keep a lookup that began before a sign-out', () => {
    const cache = new SessionCache();
    const begun = cache.begin();
    // The session is looked up, signs out elsewhere in the process, then the lookup returns.
    cache.forgetSession('s1');
    cache.set('h1', entry('s1'), begun);
    expect(cache.get('h1')).toBeUndefined();
    cache.set('h1', entry('s1'), cache.begin());
    expect(cache.get('h1')?.id).toBe('s1');
  });
});
