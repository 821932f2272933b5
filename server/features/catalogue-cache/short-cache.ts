/**
 * A small in-process cache whose entries live `ttlMs` at most and which can be emptied at once (when the
 * catalogue changes). Holds at most `maxEntries`, dropping the oldest first. Time comes from `now`.
 * With `staleMs`, an entry past its time is still offered by `peek` for that long, marked stale, so a caller
 * can serve it while it loads a fresh one (stale-while-revalidate, as RFC 5861 describes it for HTTP caches).
 */
export class ShortCache<T> {
  private readonly entries = new Map<string, { value: T; expires: number }>();
  /** Bumped by every clear, so a value loaded before a clear is not kept after it. */
  private generation = 0;
  /** Off until whoever empties the cache on change is ready (nothing is kept or served meanwhile). */
  enabled = true;

  constructor(
    private readonly ttlMs: number,
    private readonly maxEntries = 500,
    private readonly now: () => number = Date.now,
    private readonly staleMs = 0,
  ) {}

  /** The entry while it is fresh. */
  get(key: string): T | undefined {
    const entry = this.peek(key);
    return entry?.fresh ? entry.value : undefined;
  }

  /** The entry while it is fresh or within its stale time, saying which. */
  peek(key: string): { value: T; fresh: boolean } | undefined {
    if (!this.enabled) return undefined;
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    const now = this.now();
    if (entry.expires + this.staleMs <= now) {
      this.entries.delete(key);
      return undefined;
    }
    return { value: entry.value, fresh: entry.expires > now };
  }

  /** Taken before loading a value and given back to `set`: a value loaded across a clear is dropped. */
  get mark(): number {
    return this.generation;
  }

  set(key: string, value: T, mark = this.generation): void {
    if (this.ttlMs <= 0 || !this.enabled || mark !== this.generation) return;
    this.entries.delete(key);
    this.entries.set(key, { value, expires: this.now() + this.ttlMs });
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
  }

  /** The cached value, or the loaded one (cached for next time). */
  async getOrLoad(key: string, load: () => Promise<T>): Promise<T> {
    const hit = this.get(key);
    if (hit !== undefined) return hit;
    const mark = this.mark;
    const value = await load();
    this.set(key, value, mark);
    return value;
  }

  clear(): void {
    this.entries.clear();
    this.generation++;
  }

  get size(): number {
    return this.entries.size;
  }
}
