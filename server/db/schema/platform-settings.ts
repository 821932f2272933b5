import { integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/**
 * Platform settings an admin may change (fee, windows, tolerances), one row per key. Values are
 * validated by `shared/contracts/platform-settings.ts`; read them through `server/features/settings`.
 */
export const platformSettings = pgTable('platform_settings', {
  key: text().primaryKey(),
  value: jsonb().notNull(),
  updatedBy: integer().references(() => users.id),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});
