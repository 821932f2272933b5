import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { payoutStatus } from './enums';
import { farms } from './farms';
import { orders } from './orders';
import { users } from './users';

/**
 * A settlement run an admin reviewed and started. `requestKey` comes from the admin's page, so the same
 * submission sent twice finds the first batch instead of making a second.
 */
export const payoutBatches = pgTable('payout_batches', {
  id: integer().primaryKey().generatedAlwaysAsIdentity(),
  requestKey: text().notNull().unique(),
  createdBy: integer().references(() => users.id),
  createdAt: timestamp({ withTimezone: true }).notNull(),
  settledAt: timestamp({ withTimezone: true }),
});

/**
 * One transfer to one grower in a batch, in integer cents. `idempotencyKey` is sent to the payment
 * provider with the transfer, so a retry after a crash returns the first transfer; status follows
 * shared/lifecycle/payout-lifecycle.ts.
 */
export const payouts = pgTable(
  'payouts',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    batchId: integer().notNull().references(() => payoutBatches.id, { onDelete: 'restrict' }),
    farmId: integer().notNull().references(() => farms.id, { onDelete: 'restrict' }),
    amountCents: integer().notNull(),
    status: payoutStatus().notNull(),
    idempotencyKey: text().notNull().unique(),
    transferId: text().unique(),
    heldReason: text(),
    failureReason: text(),
    createdAt: timestamp({ withTimezone: true }).notNull(),
    sentAt: timestamp({ withTimezone: true }),
  },
  (t) => [index('payouts_farm_status_idx').on(t.farmId, t.status), index('payouts_batch_idx').on(t.batchId), check('payouts_amount_positive', sql`${t.amountCents} > 0`)],
);

/** What a payout pays for: one order each, and an order is paid to its grower once ever (unique). */
export const payoutLines = pgTable(
  'payout_lines',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    payoutId: integer().notNull().references(() => payouts.id, { onDelete: 'restrict' }),
    orderId: integer().notNull().unique().references(() => orders.id, { onDelete: 'restrict' }),
    goodsCents: integer().notNull(),
    freightCents: integer().notNull(),
    /** Refunded to the buyer before the payout: the grower's share bears it. */
    refundedCents: integer().notNull(),
    amountCents: integer().notNull(),
  },
  (t) => [index('payout_lines_payout_idx').on(t.payoutId)],
);
