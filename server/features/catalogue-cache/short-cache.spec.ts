import { ShortCache } from './short-cache';

describe('ShortCache', () => {
  it('serves an entry until its time is up, then loads again (common practice: time-to-live cache)', async () => {
    let now = 1_000;
    const cache = new ShortCache<number>(10_000, 10, () => now);
    let loads = 0;
    const load = async () => ++loads;
    expect(await cache.getOrLoad('a', load)).toBe(1);
    now += 9_999;
    expect(await cache.getOrLoad('a', load)).toBe(1);
    now += 1;
    expect(await cache.getOrLoad('a', load)).toBe(2);
  });

  it('keeps at most maxEntries, dropping the oldest first', () => {
    const cache = new ShortCache<string>(10_000, 2);
    cache.set('a', 'A');
    cache.set('b', 'B');
    cache.set('c', 'C');
    expect([cache.get('a'), cache.get('b'), cache.get('c')]).toEqual([undefined, 'B', 'C']);
  });

  it('forgets everything on clear, and keeps nothing while disabled or with no time to live', () => {
    const cache = new ShortCache<string>(10_000);
    cache.set('a', 'A');
    cache.clear();
    expect(cache.get('a')).toBeUndefined();
    cache.enabled = false;
    cache.set('b', 'B');
    cache.enabled = true;
    expect(cache.get('b')).toBeUndefined();
    const off = new ShortCache<string>(0);
    off.set('c', 'C');
    expect(off.get('c')).toBeUndefined();
  });
});
