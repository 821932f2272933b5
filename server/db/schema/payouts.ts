import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { payoutStatus } from './enums';
import { farms } from './farms';
import { orders } from './orders';

/** Money owed to or sent to a grower for one order, in integer cents. */
export const payouts = pgTable(
  'payouts',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    farmId: integer().notNull().references(() => farms.id, { onDelete: 'restrict' }),
    orderId: integer().notNull().unique().references(() => orders.id, { onDelete: 'restrict' }),
    amountCents: integer().notNull(),
    status: payoutStatus().notNull().default('held'),
    transferId: text().unique(),
    failureReason: text(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp({ withTimezone: true }),
  },
  (t) => [index('payouts_farm_status_idx').on(t.farmId, t.status), check('payouts_amount_nonnegative', sql`${t.amountCents} >= 0`)],
);
