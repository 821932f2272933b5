/**
 * A small in-process cache whose entries live `ttlMs` at most and which can be emptied at once (when the
 * catalogue changes). Holds at most `maxEntries`, dropping the oldest first. Time comes from `now`.
 */
export class ShortCache<T> {
  private readonly entries = new Map<string, { value: T; expires: number }>();
  /** Off until whoever empties the cache on change is ready (nothing is kept or served meanwhile). */
  enabled = true;

  constructor(
    private readonly ttlMs: number,
    private readonly maxEntries = 500,
    private readonly now: () => number = Date.now,
  ) {}

  get(key: string): T | undefined {
    if (!this.enabled) return undefined;
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    if (entry.expires <= this.now()) {
      this.entries.delete(key);
      return undefined;
    }
    return entry.value;
  }

  set(key: string, value: T): void {
    if (this.ttlMs <= 0 || !this.enabled) return;
    this.entries.delete(key);
    this.entries.set(key, { value, expires: this.now() + this.ttlMs });
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
  }

  /** The cached value, or the loaded one (cached for next time). */
  async getOrLoad(key: string, load: () => Promise<T>): Promise<T> {
    const hit = this.get(key);
    if (hit !== undefined) return hit;
    const value = await load();
    this.set(key, value);
    return value;
  }

  clear(): void {
    this.entries.clear();
  }

  get size(): number {
    return this.entries.size;
  }
}
