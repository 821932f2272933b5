import { sql } from 'drizzle-orm';
import type { ClientRateLimitInfo, IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Clock } from '../clock';
import type { Db } from '../db/client';

/**
 * express-rate-limit's counts in PostgreSQL (`rate_limit_hits`), so every server process (one per core)
 * shares one count instead of each allowing the full limit. Each hit is one atomic upsert: a key whose
 * window has passed starts again at 1. `prefix` separates limiters (and servers that must not share counts).
 */
export class PgRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly db: Db,
    private readonly clock: Clock,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const now = this.clock.now();
    const resetAt = new Date(now.getTime() + this.windowMs);
    const { rows } = await this.db.execute<{ hits: number; reset_at: Date | string }>(sql`
      insert into rate_limit_hits (key, hits, reset_at) values (${this.prefix + key}, 1, ${resetAt.toISOString()})
      on conflict (key) do update set
        hits = case when rate_limit_hits.reset_at <= ${now.toISOString()} then 1 else rate_limit_hits.hits + 1 end,
        reset_at = case when rate_limit_hits.reset_at <= ${now.toISOString()} then excluded.reset_at else rate_limit_hits.reset_at end
      returning hits, reset_at`);
    // Now and then, forget windows long past (any process may do it; the table stays small).
    if (Math.random() < 0.01) await this.db.execute(sql`delete from rate_limit_hits where reset_at < ${now.toISOString()}`);
    return { totalHits: Number(rows[0]!.hits), resetTime: new Date(rows[0]!.reset_at) };
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const { rows } = await this.db.execute<{ hits: number; reset_at: Date | string }>(
      sql`select hits, reset_at from rate_limit_hits where key = ${this.prefix + key} and reset_at > ${this.clock.now().toISOString()}`,
    );
    return rows[0] ? { totalHits: Number(rows[0].hits), resetTime: new Date(rows[0].reset_at) } : undefined;
  }

  async decrement(key: string): Promise<void> {
    await this.db.execute(sql`update rate_limit_hits set hits = greatest(hits - 1, 0) where key = ${this.prefix + key} and reset_at > ${this.clock.now().toISOString()}`);
  }

  async resetKey(key: string): Promise<void> {
    await this.db.execute(sql`delete from rate_limit_hits where key = ${this.prefix + key}`);
  }
}
