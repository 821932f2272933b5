import { randomUUID } from 'node:crypto';
import { and, eq, gte, inArray, lt, lte, sql } from 'drizzle-orm';
import type { CalendarDay, DeliverySettings, HandOver, OrderView, WindowRequest } from '@shared/contracts/orders';
import { checkDeliveryTransition, type DeliveryEvent } from '@shared/lifecycle/delivery-lifecycle';
import { ORDER_HOLDS_STOCK } from '@shared/lifecycle/order-lifecycle';
import type { Actor } from '@shared/lifecycle/state-machine';
import { scaleTicketRefundCents } from '@shared/pricing/order-total';
import { shortTonsToLb } from '@shared/units/mass';
import type { ApiDeps } from '../../api-deps';
import { deliveries, farms, lots, orderLines, orders, storedFiles, users } from '../../db/schema';
import { SettingsService } from '../settings/settings.service';
import { conflict, forbidden, HttpError, notFound } from '../../middleware/http-error';
import { sniffPhoto } from '../uploads/file-sniff';
import { sha256 } from '../uploads/photo-upload';
import { writeThenRecord } from '../uploads/write-then-record';
import { farmDay, farmInstant, nextDay } from '@shared/time/farm-time';
import { daysFrom, windowFor } from './delivery-window';
import { orderLotTitles } from './order-lines';
import { loadOrderRecord, readableOrder, type OrderRecord } from './order-record';
import { applyOrderEvent, lockOrder, type Tx } from './order-transition';
import { plusDays } from '@shared/time/days';
import type { OrdersService } from './orders.service';

type Deps = Pick<ApiDeps, 'db' | 'clock' | 'storage'>;
type Part = 'buyer' | 'grower' | 'admin';

/**
 * Agreeing when the hay changes hands, handing it over (with the scale ticket), and the buyer's answer.
 * Every step goes through the delivery and order life-cycles in shared/lifecycle.
 */
export class DeliveriesService {
  constructor(
    private readonly deps: Deps,
    private readonly orders: OrdersService,
  ) {}

  /** The buyer asks for a window (first time, or after the grower offered another). */
  async askForWindow(user: Express.User, orderId: number, request: WindowRequest): Promise<OrderView> {
    return this.moveWindow(user, orderId, request, 'ask_other_date', 'proposed');
  }

  /** The grower offers another window than the one asked for (or sets one when the buyer gave none). */
  async offerWindow(user: Express.User, orderId: number, request: WindowRequest): Promise<OrderView> {
    const view = await this.moveWindow(user, orderId, request, 'offer_other_date', 'rescheduled');
    await this.orders.notify(orderId, ['date_changed']);
    return view;
  }

  /** The grower confirms the asked-for window, or the buyer agrees to the one offered: the order is scheduled. */
  async confirm(user: Express.User, orderId: number): Promise<OrderView> {
    const { record, part } = await readableOrder(this.deps.db, orderId, user);
    const event: DeliveryEvent = record.delivery?.status === 'rescheduled' ? 'agree' : 'confirm';
    await this.deps.db.transaction(async (tx) => {
      const { order, delivery } = await this.lockBoth(tx, orderId);
      const to = this.step(delivery.status, event, part);
      if (order.method === 'delivery') await this.checkCapacity(tx, record, delivery.windowStart, orderId);
      await tx.update(deliveries).set({ status: to, updatedAt: this.now() }).where(eq(deliveries.id, delivery.id));
      if (order.status === 'paid') await applyOrderEvent(tx, order, 'schedule', { actor: part, actorId: user.id }, this.now(), {}, `Date agreed: ${farmDay(delivery.windowStart, record.farm.timeZone)}`);
    });
    await this.orders.notify(orderId, ['date_confirmed']);
    return this.orders.get(user, orderId);
  }

  /**
   * The grower marks the load delivered or picked up, optionally with the scale ticket's net tons (of the
   * order's one ton-priced line, or of each line) and a photo of it. Ton-priced lines weighed short are
   * refunded the difference, once for the order; more tons never cost more.
   */
  async handOver(user: Express.User, orderId: number, input: HandOver, ticket?: Express.Multer.File): Promise<OrderView> {
    const { record, part } = await readableOrder(this.deps.db, orderId, user);
    const weighed = weighedLines(record.lines, input);
    const key = ticket ? `scale-tickets/${orderId}/${randomUUID()}` : null;
    const sniffed = ticket ? await sniffPhoto(ticket.buffer, ticket.originalname) : null;
    const files = ticket && key ? [{ key, data: ticket.buffer }] : [];
    const { acceptanceDays } = await new SettingsService(this.deps.db, this.deps.clock).current();
    await writeThenRecord(this.deps.storage, files, () =>
      this.deps.db.transaction(async (tx) => {
        const { order, delivery } = await this.lockBoth(tx, orderId);
        const to = this.step(delivery.status, 'hand_over', part);
        let fileId: number | null = null;
        if (ticket && key && sniffed) {
          const [file] = await tx
            .insert(storedFiles)
            .values({ ownerId: user.id, storageKey: key, originalName: ticket.originalname.slice(0, 200), mimeType: sniffed.mimeType, sizeBytes: ticket.size, sha256: sha256(ticket.buffer) })
            .returning({ id: storedFiles.id });
          fileId = file!.id;
        }
        const now = this.now();
        const ticketTons = weighed.reduce((s, w) => s + w.weighedTons, 0);
        await tx
          .update(deliveries)
          .set({ status: to, completedAt: now, updatedAt: now, scaleTicketLb: ticketTons > 0 ? shortTonsToLb(ticketTons) : null, scaleTicketFileId: fileId })
          .where(eq(deliveries.id, delivery.id));
        for (const w of weighed) await tx.update(orderLines).set({ weighedTons: w.weighedTons }).where(and(eq(orderLines.id, w.lineId), eq(orderLines.orderId, orderId)));
        const note = weighed.length === 0 ? '' : `Scale ticket: ${weighed.map((w) => (record.lines.length > 1 ? `${w.weighedTons} t of “${w.title}”` : `${w.weighedTons} t`)).join(', ')}`;
        await applyOrderEvent(tx, order, 'deliver', { actor: part === 'admin' ? 'admin' : 'grower', actorId: user.id }, now, {
          deliveredAt: now,
          acceptBy: plusDays(now, acceptanceDays),
        }, note);
      }),
    );
    if (weighed.length > 0) {
      const after = (await loadOrderRecord(this.deps.db, orderId))!;
      const refund = scaleTicketRefundCents({
        lines: after.lines.map(({ line }) => ({ pricingUnit: line.pricingUnit, priceCentsPerTon: line.priceCentsPerTon, paidGoodsCents: line.goodsCents, weighedTons: line.weighedTons })),
        paidFeeCents: after.order.platformFeeCents,
        feeBps: after.order.platformFeeBps,
      });
      // One key per order: the hand-over happens once, and a retry after a crash finds the refund already claimed.
      await this.orders.refundOnce(after.order, refund, 'scale_ticket', `order-${orderId}-scale-ticket`);
    }
    await this.orders.notify(orderId, ['delivered']);
    return this.orders.get(user, orderId);
  }

  /** The buyer accepts the load: the order is complete and the receipt goes out. */
  async accept(user: Express.User, orderId: number): Promise<OrderView> {
    const { part } = await readableOrder(this.deps.db, orderId, user);
    await this.deps.db.transaction(async (tx) => {
      const order = (await lockOrder(tx, orderId))!;
      await applyOrderEvent(tx, order, 'accept', { actor: part, actorId: user.id }, this.now());
    });
    await this.orders.notify(orderId, ['receipt']);
    return this.orders.get(user, orderId);
  }

  /**
   * Loads delivered with no answer from the buyer complete when the acceptance period ends (a scheduled
   * job). Safe to run twice at once: each order is completed under its row lock, and only the run that
   * completed it sends the receipt. Returns how many this run completed.
   */
  async completeUnanswered(): Promise<number> {
    const due = await this.deps.db.select({ id: orders.id }).from(orders).where(and(eq(orders.status, 'delivered'), lte(orders.acceptBy, this.now())));
    let completed = 0;
    for (const { id } of due) {
      const done = await this.deps.db.transaction(async (tx) => {
        const order = await lockOrder(tx, id);
        if (order?.status !== 'delivered') return false;
        await applyOrderEvent(tx, order, 'accept', { actor: 'system', actorId: null }, this.now(), {}, 'No problem reported within the acceptance period.');
        return true;
      });
      if (!done) continue;
      completed++;
      await this.orders.notify(id, ['receipt']);
    }
    return completed;
  }

  async settings(user: Express.User): Promise<DeliverySettings> {
    const farm = await this.ownFarm(user);
    return { deliveryWeekdays: farm.deliveryWeekdays, loadsPerDay: farm.loadsPerDay, tonsPerLoad: farm.tonsPerLoad, balesPerLoad: farm.balesPerLoad, pickupFromHour: farm.pickupFromHour, pickupToHour: farm.pickupToHour };
  }

  async saveSettings(user: Express.User, input: DeliverySettings): Promise<DeliverySettings> {
    const farm = await this.ownFarm(user);
    await this.deps.db.update(farms).set({ ...input, deliveryWeekdays: [...input.deliveryWeekdays].sort() }).where(eq(farms.id, farm.id));
    return this.settings(user);
  }

  /** The grower's week (or any run of days): loads booked per day against the loads the farm can haul. */
  async calendar(user: Express.User, from: string, days: number): Promise<{ days: CalendarDay[]; timeZone: string }> {
    const farm = await this.ownFarm(user);
    return { days: await this.days(farm, from, days, true), timeZone: farm.timeZone };
  }

  /** Days a buyer can ask for delivery or pickup from a lot's farm, from tomorrow, with the room left. */
  async openDays(lotId: number, days = 21): Promise<{ days: CalendarDay[]; pickupFromHour: number; pickupToHour: number; timeZone: string }> {
    const [row] = await this.deps.db.select({ farm: farms }).from(lots).innerJoin(farms, eq(farms.id, lots.farmId)).where(and(eq(lots.id, lotId), inArray(lots.status, ['listed', 'sold_out'])));
    if (!row) throw notFound('Lot');
    const tomorrow = nextDay(farmDay(this.now(), row.farm.timeZone));
    return { days: await this.days(row.farm, tomorrow, days, false), pickupFromHour: row.farm.pickupFromHour, pickupToHour: row.farm.pickupToHour, timeZone: row.farm.timeZone };
  }

  private async days(farm: typeof farms.$inferSelect, from: string, count: number, withOrders: boolean): Promise<CalendarDay[]> {
    const dates = daysFrom(from, count);
    // The farm's days, from its midnight to its next midnight.
    const start = farmInstant(dates[0]!, 0, farm.timeZone);
    const end = farmInstant(nextDay(dates.at(-1)!), 0, farm.timeZone);
    const rows = await this.deps.db
      .select({ order: orders, delivery: deliveries, buyerName: users.displayName, lotTitle: orderLotTitles })
      .from(deliveries)
      .innerJoin(orders, eq(orders.id, deliveries.orderId))
      .innerJoin(users, eq(users.id, orders.buyerId))
      .where(and(eq(orders.farmId, farm.id), inArray(orders.status, [...ORDER_HOLDS_STOCK]), gte(deliveries.windowStart, start), lt(deliveries.windowStart, end)));
    return dates.map((date) => {
      const today = rows.filter((r) => farmDay(r.delivery.windowStart, farm.timeZone) === date);
      const deliveryDay = farm.deliveryWeekdays.includes(new Date(`${date}T00:00:00Z`).getUTCDay());
      return {
        date,
        deliveryDay,
        capacityLoads: deliveryDay ? farm.loadsPerDay : 0,
        bookedLoads: today.filter((r) => r.order.method === 'delivery').reduce((s, r) => s + r.order.loads, 0),
        orders: withOrders
          ? today.map((r) => ({ id: r.order.id, status: r.order.status, deliveryStatus: r.delivery.status, method: r.order.method, loads: r.order.loads, buyerName: r.buyerName, lotTitle: r.lotTitle, windowStart: r.delivery.windowStart.toISOString() }))
          : [],
      };
    });
  }

  private async moveWindow(user: Express.User, orderId: number, request: WindowRequest, event: DeliveryEvent, initial: 'proposed' | 'rescheduled'): Promise<OrderView> {
    const { record, part } = await readableOrder(this.deps.db, orderId, user);
    if (!['paid', 'scheduled', 'awaiting_payment'].includes(record.order.status)) throw conflict('order_state', 'The date can only be changed before the hay is handed over.');
    const window = windowFor(record.farm, record.order.method, request, this.now());
    await this.deps.db.transaction(async (tx) => {
      const order = (await lockOrder(tx, orderId))!;
      const [delivery] = await tx.select().from(deliveries).where(eq(deliveries.orderId, orderId)).for('update');
      if (delivery) {
        const to = this.step(delivery.status, event, part);
        await tx.update(deliveries).set({ status: to, windowStart: window.start, windowEnd: window.end, updatedAt: this.now() }).where(eq(deliveries.id, delivery.id));
      } else {
        if ((initial === 'proposed') !== (part === 'buyer')) throw forbidden(initial === 'proposed' ? 'Only the buyer asks for a date.' : 'Only the grower offers a date.');
        await tx.insert(deliveries).values({ orderId, method: order.method, status: initial, windowStart: window.start, windowEnd: window.end, updatedAt: this.now() });
      }
      // A date moved after it was agreed has to be agreed again.
      if (order.status === 'scheduled') await applyOrderEvent(tx, order, 'reschedule', { actor: part, actorId: user.id }, this.now(), {}, `New date: ${request.date}`);
    });
    return this.orders.get(user, orderId);
  }

  private async checkCapacity(tx: Tx, record: OrderRecord, windowStart: Date, orderId: number) {
    const day = farmDay(windowStart, record.farm.timeZone);
    const start = farmInstant(day, 0, record.farm.timeZone);
    const dayEnd = farmInstant(nextDay(day), 0, record.farm.timeZone);
    const [booked] = await tx
      .select({ loads: sql<number>`coalesce(sum(${orders.loads}), 0)::int` })
      .from(deliveries)
      .innerJoin(orders, eq(orders.id, deliveries.orderId))
      .where(and(eq(orders.farmId, record.farm.id), eq(orders.method, 'delivery'), inArray(deliveries.status, ['confirmed', 'in_transit', 'done']), gte(deliveries.windowStart, start), lt(deliveries.windowStart, dayEnd), sql`${orders.id} <> ${orderId}`));
    if ((booked?.loads ?? 0) + record.order.loads > record.farm.loadsPerDay) {
      throw conflict('day_full', `${day} already has ${booked?.loads ?? 0} of ${record.farm.loadsPerDay} loads booked; offer the buyer another day.`);
    }
  }

  private async lockBoth(tx: Tx, orderId: number) {
    const order = await lockOrder(tx, orderId);
    if (!order) throw notFound('Order');
    const [delivery] = await tx.select().from(deliveries).where(eq(deliveries.orderId, orderId)).for('update');
    if (!delivery) throw conflict('no_date', 'No date has been asked for or offered yet.');
    if (!['paid', 'scheduled'].includes(order.status)) throw conflict('order_state', 'This order is not paid, or its hay has already been handed over.');
    return { order, delivery };
  }

  private step(from: (typeof deliveries.$inferSelect)['status'], event: DeliveryEvent, part: Part) {
    const check = checkDeliveryTransition(from, event, part as Actor);
    if (!check.ok) throw check.reason === 'not_allowed' ? forbidden(check.message) : conflict('delivery_state', check.message);
    return check.to;
  }

  private async ownFarm(user: Express.User) {
    const [farm] = await this.deps.db.select().from(farms).where(eq(farms.ownerId, user.id)).limit(1);
    if (!farm) throw new HttpError(409, 'no_farm', 'Save your farm profile first.');
    return farm;
  }

  private now() {
    return this.deps.clock.now();
  }
}

/**
 * The scale ticket's tons per line: `weighedTons` belongs to the order's one ton-priced line (or its only
 * line); `lines` names each line. A line of another order, or tons the order cannot place, is a 400.
 */
export function weighedLines(lines: OrderRecord['lines'], input: HandOver): { lineId: number; title: string; weighedTons: number }[] {
  if (input.lines) {
    return input.lines.map((w) => {
      const found = lines.find((l) => l.line.id === w.lineId);
      if (!found) throw new HttpError(400, 'unknown_line', `Line ${w.lineId} is not part of this order.`, [{ path: 'lines', message: 'Not a line of this order.' }]);
      return { lineId: w.lineId, title: found.lot.title, weighedTons: w.weighedTons };
    });
  }
  if (input.weighedTons === undefined) return [];
  const byTon = lines.filter((l) => l.line.pricingUnit === 'ton');
  const target = lines.length === 1 ? lines[0] : byTon.length === 1 ? byTon[0] : undefined;
  if (!target) throw new HttpError(400, 'weigh_each_line', 'This order holds several lots sold by the ton: give the weighed tons of each line.', [{ path: 'lines', message: 'Give the weighed tons of each line.' }]);
  return [{ lineId: target.line.id, title: target.lot.title, weighedTons: input.weighedTons }];
}
