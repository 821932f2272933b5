import { bigint, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/**
 * Append-only record of who did what to which entity, and when (approvals, refunds, payouts, role changes,
 * settings). `before` and `after` hold the changed fields. A database trigger refuses UPDATE and DELETE
 * (migration 0001_audit_append_only), so no code path can rewrite history.
 */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: bigint({ mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    // No ON DELETE action: the audit row may never be rewritten, so a user with history cannot be deleted.
    actorId: integer().references(() => users.id),
    action: text().notNull(),
    entityType: text().notNull(),
    entityId: text().notNull(),
    data: jsonb().notNull().default({}),
    before: jsonb(),
    after: jsonb(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_events_entity_idx').on(t.entityType, t.entityId), index('audit_events_created_idx').on(t.createdAt)],
);
