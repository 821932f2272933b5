import { alias } from 'drizzle-orm/pg-core';
import { asc, eq } from 'drizzle-orm';
import type { Actor } from '@shared/lifecycle/state-machine';
import type { OrderView } from '@shared/contracts/orders';
import { deliveryEventsFor } from '@shared/lifecycle/delivery-lifecycle';
import { orderEventsFor } from '@shared/lifecycle/order-lifecycle';
import type { Db } from '../../db/client';
import { deliveries, farms, orderEvents, orders, users } from '../../db/schema';
import { notFound } from '../../middleware/http-error';
import { lineTotals, linesOf, lineView } from './order-lines';
import type { OrderMailFacts } from './order-mail';
import type { Tx } from './order-transition';

const buyers = alias(users, 'buyers');
const growers = alias(users, 'growers');

/** An order with its lines (and their lots), farm, buyer, grower and delivery. */
export async function loadOrderRecord(db: Db | Tx, id: number) {
  const [row] = await db
    .select({ order: orders, farm: farms, buyer: buyers, grower: growers })
    .from(orders)
    .innerJoin(farms, eq(farms.id, orders.farmId))
    .innerJoin(buyers, eq(buyers.id, orders.buyerId))
    .innerJoin(growers, eq(growers.id, farms.ownerId))
    .where(eq(orders.id, id));
  if (!row) return undefined;
  const [delivery] = await db.select().from(deliveries).where(eq(deliveries.orderId, id)).orderBy(asc(deliveries.loadNumber)).limit(1);
  return { ...row, lines: await linesOf(db, [id]), delivery };
}
export type OrderRecord = NonNullable<Awaited<ReturnType<typeof loadOrderRecord>>>;

/** The viewer's part in an order; 404 for anyone else (an order's existence is private). */
export function viewerPart(record: OrderRecord, user: Express.User): 'buyer' | 'grower' | 'admin' {
  if (user.role === 'admin') return 'admin';
  if (record.order.buyerId === user.id) return 'buyer';
  if (record.farm.ownerId === user.id) return 'grower';
  throw notFound('Order');
}

export async function readableOrder(db: Db, id: number, user: Express.User) {
  const record = await loadOrderRecord(db, id);
  if (!record) throw notFound('Order');
  return { record, part: viewerPart(record, user) };
}

export function mailFacts(r: OrderRecord): OrderMailFacts {
  return {
    orderId: r.order.id,
    lines: r.lines.map(({ line, lot }) => ({ title: lot.title, forageType: lot.forageType, cutting: lot.cutting, bales: line.bales, tons: line.tons })),
    farmName: r.farm.name,
    ...lineTotals(r.lines),
    method: r.order.method,
    freightCents: r.order.freightCents,
    platformFeeCents: r.order.platformFeeCents,
    totalCents: r.order.totalCents,
    refundedCents: r.order.refundedCents,
    windowStart: r.delivery?.windowStart ?? null,
    timeZone: r.farm.timeZone,
    deliveryAddress: r.order.deliveryAddress,
  };
}

const iso = (d: Date | null | undefined) => d?.toISOString() ?? null;

export async function orderView(db: Db, r: OrderRecord, part: Actor & ('buyer' | 'grower' | 'admin')): Promise<OrderView> {
  const timeline = await db.select().from(orderEvents).where(eq(orderEvents.orderId, r.order.id)).orderBy(asc(orderEvents.id));
  const o = r.order;
  const d = r.delivery;
  return {
    id: o.id,
    status: o.status,
    lines: r.lines.map(lineView),
    farm: { id: r.farm.id, name: r.farm.name, city: r.farm.city, state: r.farm.state, pickupFromHour: r.farm.pickupFromHour, pickupToHour: r.farm.pickupToHour, timeZone: r.farm.timeZone },
    buyer: { displayName: r.buyer.displayName, email: part === 'buyer' || part === 'admin' || o.status !== 'awaiting_payment' ? r.buyer.email : '' },
    ...lineTotals(r.lines),
    freightCents: o.freightCents,
    platformFeeCents: o.platformFeeCents,
    platformFeeBps: o.platformFeeBps,
    totalCents: o.totalCents,
    refundedCents: o.refundedCents,
    method: o.method,
    loads: o.loads,
    deliveryZip: o.deliveryZip,
    deliveryAddress: o.deliveryAddress,
    distanceMi: o.distanceMi,
    paymentUrl: part === 'buyer' && o.status === 'awaiting_payment' ? o.paymentUrl : null,
    reservedUntil: iso(o.reservedUntil),
    paidAt: iso(o.paidAt),
    deliveredAt: iso(o.deliveredAt),
    acceptBy: iso(o.acceptBy),
    cancelReason: o.cancelReason,
    createdAt: o.createdAt.toISOString(),
    delivery: d
      ? {
          id: d.id,
          method: d.method,
          status: d.status,
          windowStart: d.windowStart.toISOString(),
          windowEnd: d.windowEnd.toISOString(),
          scaleTicketLb: d.scaleTicketLb,
          hasScaleTicket: d.scaleTicketFileId !== null,
          completedAt: iso(d.completedAt),
        }
      : null,
    timeline: timeline.map((t) => ({ event: t.event, status: t.status, actor: t.actor, note: t.note, at: t.createdAt.toISOString() })),
    actions: [...orderEventsFor(o.status, part), ...deliveryActions(o.status, d?.status ?? null, part)],
    viewerRole: part,
  };
}

/** Delivery steps open to the viewer: agreeing a window is possible once paid and until handed over. */
function deliveryActions(status: OrderView['status'], delivery: OrderView['delivery'] extends infer D ? (D extends { status: infer S } ? S : never) | null : never, part: 'buyer' | 'grower' | 'admin'): string[] {
  if (!['paid', 'scheduled'].includes(status)) return [];
  if (delivery === null) return part === 'buyer' ? ['delivery:ask_other_date'] : ['delivery:offer_other_date'];
  return deliveryEventsFor(delivery, part).map((e) => `delivery:${e}`);
}
