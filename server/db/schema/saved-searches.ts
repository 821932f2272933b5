import { boolean, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/** A buyer's stored catalogue query; `alerts` sends an e-mail when a newly approved lot matches. */
export const savedSearches = pgTable(
  'saved_searches',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    userId: integer().notNull().references(() => users.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    query: jsonb().$type<Record<string, string>>().notNull(),
    alerts: boolean().notNull().default(true),
    lastAlertedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('saved_searches_user_idx').on(t.userId)],
);
