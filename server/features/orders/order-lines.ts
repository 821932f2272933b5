import { asc, eq, inArray, sql } from 'drizzle-orm';
import type { OrderLineView } from '@shared/contracts/orders';
import type { Db } from '../../db/client';
import { lots, orderLines } from '../../db/schema';
import type { Tx } from './order-transition';

// Written out with table names: Drizzle leaves columns unqualified in a one-table select, and inside these
// subqueries "id" would then name the line's, not the order's.
/** An order's hay total in SQL: the sum of its lines (one home: order_lines.goods_cents). */
export const orderGoodsCents = sql<number>`(select coalesce(sum(ol.goods_cents), 0) from order_lines ol where ol.order_id = "orders"."id")`.mapWith(Number);

/** An order's lots by name in SQL, in line order ("Lot A + Lot B"), for lists and statements. */
export const orderLotTitles = sql<string>`(select string_agg(l.title, ' + ' order by ol.id) from order_lines ol join lots l on l.id = ol.lot_id where ol.order_id = "orders"."id")`;

export type OrderLineRow = typeof orderLines.$inferSelect;
export type LineWithLot = { line: OrderLineRow; lot: typeof lots.$inferSelect };

/** The lines of some orders with their lots, in line order. */
export async function linesOf(db: Db | Tx, orderIds: readonly number[]): Promise<LineWithLot[]> {
  if (orderIds.length === 0) return [];
  return db.select({ line: orderLines, lot: lots }).from(orderLines).innerJoin(lots, eq(lots.id, orderLines.lotId)).where(inArray(orderLines.orderId, [...orderIds])).orderBy(asc(orderLines.orderId), asc(orderLines.id));
}

/** Bales, tons and hay of an order, added up over its lines. */
export function lineTotals(lines: readonly { line: Pick<OrderLineRow, 'bales' | 'tons' | 'goodsCents'> }[]) {
  return {
    bales: lines.reduce((s, l) => s + l.line.bales, 0),
    tons: lines.reduce((s, l) => s + l.line.tons, 0),
    goodsCents: lines.reduce((s, l) => s + l.line.goodsCents, 0),
  };
}

/** A line as the order pages show it. */
export function lineView({ line, lot }: LineWithLot): OrderLineView {
  return {
    id: line.id,
    lot: { id: lot.id, title: lot.title, forageType: lot.forageType, cutting: lot.cutting, baleType: lot.baleType, avgBaleWeightLb: lot.avgBaleWeightLb },
    bales: line.bales,
    tons: line.tons,
    pricingUnit: line.pricingUnit,
    priceCentsPerTon: line.priceCentsPerTon,
    goodsCents: line.goodsCents,
    weighedTons: line.weighedTons,
  };
}
