import { and, eq, gte, sql } from 'drizzle-orm';
import { lots, orderLines } from '../../db/schema';
import type { Tx } from './order-transition';

/**
 * Takes `bales` off a listed lot in one conditional UPDATE: PostgreSQL locks the row, so of many
 * concurrent buyers only those who still find enough bales succeed. The lot shows as sold out at zero.
 * Returns false when the bales are no longer there.
 */
export async function reserveBales(tx: Tx, lotId: number, bales: number, at: Date): Promise<boolean> {
  const rows = await tx
    .update(lots)
    .set({
      balesAvailable: sql`${lots.balesAvailable} - ${bales}`,
      status: sql`case when ${lots.balesAvailable} - ${bales} = 0 then 'sold_out'::lot_status else ${lots.status} end`,
      updatedAt: at,
    })
    .where(and(eq(lots.id, lotId), eq(lots.status, 'listed'), gte(lots.balesAvailable, bales)))
    .returning({ id: lots.id });
  return rows.length === 1;
}

/** Puts released bales back on the lot; a lot sold out only by reservations goes back on sale. */
export async function releaseBales(tx: Tx, lotId: number, bales: number, at: Date): Promise<void> {
  await tx
    .update(lots)
    .set({
      balesAvailable: sql`least(${lots.baleCount}, ${lots.balesAvailable} + ${bales})`,
      status: sql`case when ${lots.status} = 'sold_out' then 'listed'::lot_status else ${lots.status} end`,
      updatedAt: at,
    })
    .where(eq(lots.id, lotId));
}

/** The lines of an order as stock: which lot, how many bales. */
async function stockLines(tx: Tx, orderId: number) {
  return tx.select({ lotId: orderLines.lotId, bales: orderLines.bales }).from(orderLines).where(eq(orderLines.orderId, orderId)).orderBy(orderLines.lotId);
}

/** Puts every line's bales of an order back on its lot (cancel, decline, expiry). */
export async function releaseOrderStock(tx: Tx, orderId: number, at: Date): Promise<void> {
  for (const line of await stockLines(tx, orderId)) await releaseBales(tx, line.lotId, line.bales, at);
}

class ShortLine extends Error {}

/**
 * Takes every line's bales of an order again, all or none (a savepoint undoes the lines already taken
 * when a later one is short). Lots are taken in id order so two orders never wait on each other in a circle.
 */
export async function reserveOrderStock(tx: Tx, orderId: number, at: Date): Promise<boolean> {
  const lines = await stockLines(tx, orderId);
  try {
    await tx.transaction(async (sp) => {
      for (const line of lines) if (!(await reserveBales(sp, line.lotId, line.bales, at))) throw new ShortLine();
    });
    return true;
  } catch (err) {
    if (err instanceof ShortLine) return false;
    throw err;
  }
}
