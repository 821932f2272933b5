import { and, eq } from 'drizzle-orm';
import type { Actor } from '@shared/lifecycle/state-machine';
import { checkOrderTransition, type OrderEvent } from '@shared/lifecycle/order-lifecycle';
import type { Db } from '../../db/client';
import { orderEvents, orders } from '../../db/schema';
import { conflict, forbidden } from '../../middleware/http-error';

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type OrderRow = typeof orders.$inferSelect;

/**
 * Moves an order along its life-cycle (shared/lifecycle/order-lifecycle.ts) inside a transaction: the
 * update only applies while the order is still in the state it was read in, so two racing steps cannot
 * both win; the step is written to the order's timeline.
 */
export async function applyOrderEvent(
  tx: Tx,
  order: OrderRow,
  event: OrderEvent,
  who: { actor: Actor; actorId: number | null },
  at: Date,
  changes: Partial<typeof orders.$inferInsert> = {},
  note = '',
): Promise<OrderRow> {
  const check = checkOrderTransition(order.status, event, who.actor);
  if (!check.ok) throw check.reason === 'not_allowed' ? forbidden(check.message) : conflict('order_state', check.message);
  const [updated] = await tx
    .update(orders)
    .set({ ...changes, status: check.to, updatedAt: at })
    .where(and(eq(orders.id, order.id), eq(orders.status, order.status)))
    .returning();
  if (!updated) throw conflict('order_changed', 'This order changed meanwhile; reload it and try again.');
  await tx.insert(orderEvents).values({ orderId: order.id, event, status: check.to, actor: who.actor, actorId: who.actorId, note, createdAt: at });
  return updated;
}

/** Reads an order and locks its row for the rest of the transaction. */
export async function lockOrder(tx: Tx, id: number): Promise<OrderRow | undefined> {
  const [row] = await tx.select().from(orders).where(eq(orders.id, id)).for('update');
  return row;
}
