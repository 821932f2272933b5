import { sql } from 'drizzle-orm';
import { boolean, check, date, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { claimStatus } from './enums';
import { orderLines } from './order-lines';
import { orders } from './orders';
import { storedFiles } from './files';
import { users } from './users';

/** A buyer's quality claim on an order (e.g. a retest that disagrees with the listed analysis). */
export const qualityClaims = pgTable(
  'quality_claims',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'restrict' }),
    /** The line (lot) the problem is about, when the buyer named one; null means the whole order. */
    orderLineId: integer().references(() => orderLines.id, { onDelete: 'restrict' }),
    openedBy: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    reason: text().notNull(),
    /** The certified lab's retest report PDF. */
    evidenceFileId: integer().references(() => storedFiles.id, { onDelete: 'set null' }),
    retestLabName: text(),
    retestLabCertified: boolean(),
    retestReportDate: date({ mode: 'string' }),
    /** Retest values as entered, with their basis (the engine's request shape without the forage class). */
    retestValues: jsonb().$type<Record<string, number | string>>(),
    status: claimStatus().notNull().default('open'),
    resolution: text(),
    refundCents: integer().notNull().default(0),
    resolvedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('quality_claims_order_idx').on(t.orderId),
    // One claim open per order at a time.
    uniqueIndex('quality_claims_one_open_per_order').on(t.orderId).where(sql`${t.status} = 'open'`),
    index('quality_claims_status_idx').on(t.status),
    check('quality_claims_refund_nonnegative', sql`${t.refundCents} >= 0`),
  ],
);
