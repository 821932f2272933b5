import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { claimStatus } from './enums';
import { orders } from './orders';
import { storedFiles } from './files';
import { users } from './users';

/** A buyer's quality claim on an order (e.g. a retest that disagrees with the listed analysis). */
export const qualityClaims = pgTable(
  'quality_claims',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'restrict' }),
    openedBy: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    reason: text().notNull(),
    evidenceFileId: integer().references(() => storedFiles.id, { onDelete: 'set null' }),
    status: claimStatus().notNull().default('open'),
    resolution: text(),
    refundCents: integer().notNull().default(0),
    resolvedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('quality_claims_order_idx').on(t.orderId),
    index('quality_claims_status_idx').on(t.status),
    check('quality_claims_refund_nonnegative', sql`${t.refundCents} >= 0`),
  ],
);
