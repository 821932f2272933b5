import { integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Request counts of the rate limiters (express-rate-limit's store), shared by every server process. */
export const rateLimitHits = pgTable('rate_limit_hits', {
  key: text().primaryKey(),
  hits: integer().notNull(),
  resetAt: timestamp({ withTimezone: true }).notNull(),
});
