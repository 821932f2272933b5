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

describe('ShortCache past its time', () => {
  it('offers an entry as stale for staleMs after its time, then forgets it (RFC 5861 stale-while-revalidate)', () => {
    let now = 0;
    const cache = new ShortCache<string>(10_000, 10, () => now, 60_000);
    cache.set('a', 'A');
    now = 9_999;
    expect(cache.peek('a')).toEqual({ value: 'A', fresh: true });
    now = 10_000;
    expect(cache.peek('a')).toEqual({ value: 'A', fresh: false });
    expect(cache.get('a')).toBeUndefined();
    now = 69_999;
    expect(cache.peek('a')).toEqual({ value: 'A', fresh: false });
    now = 70_000;
    expect(cache.peek('a')).toBeUndefined();
  });

  it('drops a value loaded across a clear, so nothing read before a change is kept after it', async () => {
    const cache = new ShortCache<string>(10_000);
    const mark = cache.mark;
    cache.clear();
    cache.set('a', 'read before the change', mark);
    expect(cache.get('a')).toBeUndefined();
    let release!: () => void;
    const loading = cache.getOrLoad('b', () => new Promise<string>((r) => (release = () => r('old'))));
    cache.clear();
    release();
    expect(await loading).toBe('old');
    expect(cache.get('b')).toBeUndefined();
  });
});
