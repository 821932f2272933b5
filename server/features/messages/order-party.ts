import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { farms, orders } from '../../db/schema';
import { notFound } from '../../middleware/http-error';

/** How the signed-in user stands to an order's conversation. */
export interface OrderParty {
  orderId: number;
  part: 'buyer' | 'grower' | 'admin';
  buyerId: number;
  growerId: number;
  /** Messages open once money has arrived: before that the order is only a held basket of bales. */
  paid: boolean;
}

/**
 * The order's buyer, the grower who sells it, or an admin; anyone else is told the order does not exist
 * (404, as on the order itself). Reads only what every order keeps whatever its lines: buyer, farm, payment.
 */
export async function orderParty(db: Db, orderId: number, user: { id: number; role: Express.User['role'] }): Promise<OrderParty> {
  const [row] = await db
    .select({ buyerId: orders.buyerId, growerId: farms.ownerId, paidAt: orders.paidAt })
    .from(orders)
    .innerJoin(farms, eq(farms.id, orders.farmId))
    .where(eq(orders.id, orderId));
  if (!row) throw notFound('Order');
  const part = row.buyerId === user.id ? 'buyer' : row.growerId === user.id ? 'grower' : user.role === 'admin' ? 'admin' : null;
  if (!part) throw notFound('Order');
  return { orderId, part, buyerId: row.buyerId, growerId: row.growerId, paid: row.paidAt !== null };
}
