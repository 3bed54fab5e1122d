import { describe, expect, it } from 'vitest';
import { ShowAccessCache } from './show-access-cache';

describe('ShowAccessCache', () => {
  it('reuses a passed check until its time to live has passed, then forgets it', () => {
    const cache = new ShowAccessCache(5_000);
    cache.add('u:s', cache.begin(), 1_000);
    expect(cache.has('u:s', 5_999)).toBe(true);
    expect(cache.has('u:s', 6_000)).toBe(false);
    expect(cache.size).toBe(0);
  });

  it('forgets everything at once when access is taken away', () => {
    const cache = new ShowAccessCache();
    const t = Date.now();
    cache.add('a', cache.begin(), t);
    cache.add('b', cache.begin(), t);
    cache.forgetAll();
    expect([cache.has('a', t), cache.has('b', t), cache.size]).toEqual([false, false, 0]);
  });

  it('does not keep a check that began before access was taken away', () => {
    const cache = new ShowAccessCache();
    const begun = cache.begin();
    cache.forgetAll();
    cache.add('a', begun);
    expect(cache.has('a')).toBe(false);
  });
});
