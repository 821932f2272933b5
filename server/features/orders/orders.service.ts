import { and, desc, eq, inArray, lte, sql } from 'drizzle-orm';
import type { CreatedOrder, CreateOrder, GrowerQuote, LineQuote, ListCheckout, ListCheckoutResult, ListQuote, ListQuoteRequest, OrderQuote, OrderQuoteRequest, OrderSummary, OrderView, WindowRequest } from '@shared/contracts/orders';
import { RESERVATION_MINUTES } from '@shared/lifecycle/order-lifecycle';
import type { Actor } from '@shared/lifecycle/state-machine';
import { haversineMiles } from '@shared/pricing/distance';
import { balesPerLoad, growerOrderTotal, minimumBales, orderProblem, orderTotal, type GrowerOrderTotal, type LotTerms } from '@shared/pricing/order-total';
import type { ApiDeps } from '../../api-deps';
import { deliveries, farms, lots, orderEvents, orderLines, orderRefunds, orders, users } from '../../db/schema';
import { conflict, HttpError, notFound } from '../../middleware/http-error';
import { locateZip } from '../geo/geo';
import { SettingsService } from '../settings/settings.service';
import { windowFor } from './delivery-window';
import { orderMail, type OrderMailKind } from './order-mail';
import { OrderPayments } from './order-payments';
import { loadOrderRecord, mailFacts, orderView, readableOrder, type OrderRecord } from './order-record';
import { applyOrderEvent, lockOrder, type OrderRow, type Tx } from './order-transition';
import { lineTotals, linesOf, lineView } from './order-lines';
import { releaseOrderStock, reserveBales, reserveOrderStock } from './stock';

type Deps = Pick<ApiDeps, 'db' | 'stripe' | 'env' | 'clock' | 'logger' | 'jobs'>;

const round1 = (x: number) => Math.round(x * 10) / 10;

/** Orders: quoting, placing (reserving stock and opening the payment page), reading, cancelling, lists. */
export class OrdersService {
  readonly payments: OrderPayments;
  private readonly settings: SettingsService;
  constructor(private readonly deps: Deps) {
    this.payments = new OrderPayments(deps.stripe, deps.env);
    this.settings = new SettingsService(deps.db, deps.clock);
  }

  private get db() {
    return this.deps.db;
  }

  /** The figures of an order before it is placed, or why it cannot be. */
  async quote(input: OrderQuoteRequest): Promise<OrderQuote> {
    const { lot, farm } = await this.listedLot(input.lotId);
    const terms = lotTerms(lot);
    const distanceMi = input.method === 'delivery' && input.deliveryZip ? this.distance(farm, input.deliveryZip) : null;
    const request = { bales: input.bales, method: input.method, distanceMi };
    const problem = orderProblem(terms, request);
    const { platformFeeBps } = await this.settings.current();
    const total = orderTotal(terms, request, platformFeeBps, farm);
    return { lotId: lot.id, ...total, platformFeeBps, distanceMi, minBales: minimumBales(terms), balesAvailable: lot.balesAvailable, balesPerLoad: balesPerLoad(farm, lot.avgBaleWeightLb), problem: problem?.message ?? null };
  }

  /** The figures of a hay list before checkout: one order per grower, freight on each grower's combined loads. */
  async quoteList(input: ListQuoteRequest): Promise<ListQuote> {
    const { platformFeeBps } = await this.settings.current();
    const growers: GrowerQuote[] = [];
    for (const group of groupByFarm(await Promise.all(input.lines.map(async (line) => ({ ...(await this.listedLot(line.lotId)), line }))))) {
      const { farm } = group[0]!;
      const distanceMi = input.method === 'delivery' && input.deliveryZip ? this.distance(farm, input.deliveryZip) : null;
      const lines: LineQuote[] = group.map(({ lot, line }) => {
        const terms = lotTerms(lot);
        const problem = orderProblem(terms, { bales: line.bales, method: input.method, distanceMi }) ?? (input.method === 'pickup' && !lot.pickupAllowed ? { message: 'This lot is not sold for pickup at the farm; choose delivery.' } : null);
        return { lotId: lot.id, lotTitle: lot.title, bales: line.bales, tons: 0, goodsCents: 0, minBales: minimumBales(terms), balesAvailable: lot.balesAvailable, balesPerLoad: balesPerLoad(farm, lot.avgBaleWeightLb), problem: problem?.message ?? null };
      });
      const total = growerOrderTotal(group.map(({ lot, line }) => ({ terms: lotTerms(lot), bales: line.bales })), { method: input.method, distanceMi }, platformFeeBps, farm);
      total.lines.forEach((t, i) => Object.assign(lines[i]!, { tons: t.tons, goodsCents: t.goodsCents }));
      const { lines: _perLine, ...figures } = total;
      const problem = lines.find((l) => l.problem)?.problem ?? null;
      growers.push({ farmId: farm.id, farmName: farm.name, lines, ...figures, platformFeeBps, distanceMi, problem });
    }
    return { growers };
  }

  /**
   * Places an order of one lot: the bales are taken off the lot at once (held until `reservedUntil`), then
   * the payment page is opened. Bales that are gone answer 409; a payment provider that fails releases them again.
   */
  async create(user: Express.User, input: CreateOrder): Promise<CreatedOrder> {
    const [placed] = await this.place(user, [{ lotId: input.lotId, bales: input.bales }], input, false, input.window);
    return { id: placed!.id, status: placed!.status, totalCents: placed!.totalCents, paymentUrl: placed!.paymentUrl };
  }

  /**
   * Checks out a hay list: one order per grower (one payment and one truck trip for that grower's lots),
   * each with its own hold, payment page and idempotency key. Every hold is taken in one transaction, so a
   * lot that has run short answers 409 naming it and nothing else is held. Dates are agreed per order once paid.
   */
  async checkoutList(user: Express.User, input: ListCheckout): Promise<ListCheckoutResult> {
    return { orders: await this.place(user, input.lines, input, true) };
  }

  private async place(user: Express.User, lines: readonly { lotId: number; bales: number }[], how: Pick<CreateOrder, 'method' | 'deliveryZip' | 'deliveryAddress'>, nameLots: boolean, wanted?: WindowRequest) {
    // The fee rate in force now is stored with each order: a later change of the setting never reprices it.
    const { platformFeeBps } = await this.settings.current();
    const now = this.deps.clock.now();
    const checked: Checked[] = [];
    for (const [i, line] of lines.entries()) {
      const { lot, farm } = await this.listedLot(line.lotId);
      const named = (message: string) => (nameLots ? `“${lot.title}” (lot ${lot.id}): ${message}` : message);
      const path = (field: string) => (nameLots ? `lines.${i}.${field}` : field);
      const distanceMi = how.method === 'delivery' && how.deliveryZip ? this.distance(farm, how.deliveryZip) : null;
      const problem = orderProblem(lotTerms(lot), { bales: line.bales, method: how.method, distanceMi });
      if (problem?.code === 'not_enough_bales') throw new HttpError(409, 'not_enough_bales', named(problem.message), [{ path: path('bales'), message: problem.message, lotId: lot.id }]);
      if (problem) throw new HttpError(400, problem.code, named(problem.message), [{ path: problem.code === 'below_minimum' ? path('bales') : problem.code === 'no_distance' ? 'deliveryZip' : 'method', message: problem.message, lotId: lot.id }]);
      if (how.method === 'pickup' && !lot.pickupAllowed) throw new HttpError(400, 'no_pickup', named('This lot is not sold for pickup at the farm; choose delivery.'), [{ path: 'method', message: 'Not sold for pickup.', lotId: lot.id }]);
      checked.push({ lot, farm, line, distanceMi, path: path('bales') });
    }
    const drafts: Draft[] = groupByFarm(checked).map((group) => {
      const { farm, distanceMi } = group[0]!;
      const total = growerOrderTotal(group.map(({ lot, line }) => ({ terms: lotTerms(lot), bales: line.bales })), { method: how.method, distanceMi }, platformFeeBps, farm);
      return { farm, lines: group, total, distanceMi, window: wanted ? windowFor(farm, how.method, wanted, now) : null };
    });

    const placed = await this.db.transaction(async (tx) => {
      // Lots are taken in id order, so two lists holding the same lots never wait on each other in a circle.
      for (const d of [...checked].sort((x, y) => x.lot.id - y.lot.id)) {
        if (await reserveBales(tx, d.lot.id, d.line.bales, now)) continue;
        const [left] = await tx.select({ balesAvailable: lots.balesAvailable }).from(lots).where(eq(lots.id, d.lot.id));
        const n = left?.balesAvailable ?? 0;
        const message = n === 0 ? `Those bales of “${d.lot.title}” are no longer available: this lot has none left.` : `Those bales of “${d.lot.title}” are no longer available: only ${n} are left.`;
        throw new HttpError(409, 'not_enough_bales', nameLots ? `${message} Nothing was held; change the list and try again.` : message, [{ path: d.path, message, lotId: d.lot.id, balesAvailable: n }]);
      }
      const rows = [];
      for (const d of drafts) {
        const [row] = await tx
          .insert(orders)
          .values({
            buyerId: user.id,
            farmId: d.farm.id,
            freightCents: d.total.freightCents,
            platformFeeCents: d.total.platformFeeCents,
            platformFeeBps,
            totalCents: d.total.totalCents,
            method: how.method,
            loads: d.total.loads,
            deliveryZip: how.method === 'delivery' ? (how.deliveryZip ?? null) : null,
            deliveryAddress: how.method === 'delivery' ? (how.deliveryAddress ?? null) : null,
            distanceMi: d.distanceMi,
            reservedUntil: new Date(now.getTime() + RESERVATION_MINUTES * 60_000),
            createdAt: now,
            updatedAt: now,
          })
          .returning();
        await tx.insert(orderLines).values(
          d.lines.map(({ lot, line }, i) => ({
            orderId: row!.id,
            lotId: lot.id,
            bales: line.bales,
            tons: d.total.lines[i]!.tons,
            pricingUnit: lot.pricingUnit,
            priceCentsPerTon: lot.priceCentsPerTon,
            goodsCents: d.total.lines[i]!.goodsCents,
            createdAt: now,
          })),
        );
        const note = d.lines.length === 1 ? `${d.total.bales} bales reserved` : `${d.total.bales} bales reserved from ${d.lines.length} lots: ${d.lines.map(({ lot, line }) => `${line.bales} of “${lot.title}”`).join(', ')}`;
        await tx.insert(orderEvents).values({ orderId: row!.id, event: 'place', status: 'awaiting_payment', actor: 'buyer', actorId: user.id, note, createdAt: now });
        if (d.window) await tx.insert(deliveries).values({ orderId: row!.id, method: how.method, status: 'proposed', windowStart: d.window.start, windowEnd: d.window.end, updatedAt: now });
        rows.push({ row: row!, draft: d });
      }
      return rows;
    });

    const opened = [];
    for (const { row, draft } of placed) {
      const title = draft.lines.map(({ lot }) => lot.title).join(' + ');
      try {
        const session = await this.payments.startCheckout(row, { title, buyerEmail: user.email, bales: draft.total.bales, tons: draft.total.tons, goodsCents: draft.total.goodsCents });
        await this.db.update(orders).set({ checkoutSessionId: session.id, paymentUrl: session.url }).where(eq(orders.id, row.id));
        opened.push({ id: row.id, status: 'awaiting_payment' as const, totalCents: row.totalCents, paymentUrl: session.url, farmName: draft.farm.name, lines: draft.lines.map(({ lot, line }) => ({ lotId: lot.id, lotTitle: lot.title, bales: line.bales })) });
      } catch (err) {
        // All or nothing: without a payment page for every order, every hold of this checkout is let go.
        for (const p of placed) await this.abandon(p.row.id);
        throw err;
      }
    }
    return opened;
  }

  /** Ends an unpaid order whose payment page could not be opened (or whose list could not be): bales go back. */
  private async abandon(orderId: number): Promise<void> {
    const order = (await loadOrderRecord(this.db, orderId))?.order;
    if (order?.checkoutSessionId) await this.payments.close(order.checkoutSessionId).catch(() => null);
    await this.db.transaction(async (tx) => {
      const locked = await lockOrder(tx, orderId);
      if (locked?.status !== 'awaiting_payment') return;
      await applyOrderEvent(tx, locked, 'cancel', { actor: 'admin', actorId: null }, this.deps.clock.now(), { cancelReason: 'payment_provider_unreachable', reservedUntil: null }, 'The payment page could not be opened.');
      await releaseOrderStock(tx, orderId, this.deps.clock.now());
    });
  }

  /** The order for its buyer, its grower or an admin; an unpaid order is first checked with the provider. */
  async get(user: Express.User, id: number): Promise<OrderView> {
    let { record, part } = await readableOrder(this.db, id, user);
    if (record.order.status === 'awaiting_payment' && record.order.checkoutSessionId) {
      await this.reconcile(record.order).catch((err) => this.deps.logger.warn({ err, orderId: id }, 'could not check payment status'));
      record = (await loadOrderRecord(this.db, id))!;
    }
    return orderView(this.db, record, part);
  }

  /** The buyer (or an admin) cancels an unpaid order: the payment page closes and the bales go back on the lot. */
  async cancel(user: Express.User, id: number): Promise<OrderView> {
    const { record, part } = await readableOrder(this.db, id, user);
    const actor: Actor = part;
    const order = record.order;
    if (order.status === 'awaiting_payment' && order.checkoutSessionId) {
      const session = await this.payments.close(order.checkoutSessionId);
      if (session?.payment_status === 'paid') {
        await this.markPaid(order.id, session.payment_intent as string | null);
        throw conflict('already_paid', 'This order has just been paid, so it can no longer be cancelled here.');
      }
    }
    await this.db.transaction(async (tx) => {
      const locked = (await lockOrder(tx, id))!;
      await applyOrderEvent(tx, locked, 'cancel', { actor, actorId: user.id }, this.deps.clock.now(), { cancelReason: 'cancelled_by_' + part, reservedUntil: null });
      await releaseOrderStock(tx, id, this.deps.clock.now());
    });
    return this.get(user, id);
  }

  async listForBuyer(userId: number): Promise<OrderSummary[]> {
    return this.summaries(eq(orders.buyerId, userId));
  }

  async listForGrower(userId: number): Promise<OrderSummary[]> {
    const farmIds = (await this.db.select({ id: farms.id }).from(farms).where(eq(farms.ownerId, userId))).map((f) => f.id);
    if (farmIds.length === 0) return [];
    // Unpaid orders are the buyer's business until paid; the grower sees them once money has arrived.
    return this.summaries(and(inArray(orders.farmId, farmIds), sql`${orders.status} not in ('awaiting_payment', 'cancelled', 'expired')`)!);
  }

  /** Payment arrived (webhook, or found when checking): the order is paid and its bales sold. Safe to repeat. */
  async markPaid(orderId: number, paymentIntentId: string | null): Promise<void> {
    const now = this.deps.clock.now();
    const outcome = await this.db.transaction(async (tx) => {
      const order = await lockOrder(tx, orderId);
      if (!order) return 'missing' as const;
      if (order.status === 'awaiting_payment') {
        await applyOrderEvent(tx, order, 'pay', { actor: 'system', actorId: null }, now, { paidAt: now, reservedUntil: null, paymentIntentId });
        return 'paid' as const;
      }
      if ((order.status === 'cancelled' || order.status === 'expired') && !order.paidAt) {
        // Paid after the hold ran out: take every line's bales again if they are all still there, else refund in full.
        if (await reserveOrderStock(tx, orderId, now)) {
          await tx.update(orders).set({ status: 'paid', paidAt: now, paymentIntentId, cancelReason: null, updatedAt: now }).where(eq(orders.id, orderId));
          await tx.insert(orderEvents).values({ orderId, event: 'pay', status: 'paid', actor: 'system', note: 'Paid after the hold ran out; the bales were still there.', createdAt: now });
          return 'paid' as const;
        }
        await tx.update(orders).set({ paidAt: now, paymentIntentId, updatedAt: now }).where(eq(orders.id, orderId));
        return 'refund_late' as const;
      }
      return 'already' as const;
    });
    if (outcome === 'paid') await this.notify(orderId, ['order_received', 'new_order']);
    if (outcome === 'refund_late' && paymentIntentId) {
      const order = (await loadOrderRecord(this.db, orderId))!.order;
      await this.refundOnce(order, order.totalCents - order.refundedCents, 'late_payment', `order-${orderId}-late-payment-refund`, paymentIntentId);
    }
  }

  /** A declined card ends the order at once: the payment page closes and the bales go back. */
  async decline(orderId: number): Promise<void> {
    const order = (await loadOrderRecord(this.db, orderId))?.order;
    if (!order || order.status !== 'awaiting_payment') return;
    if (order.checkoutSessionId) {
      const session = await this.payments.close(order.checkoutSessionId);
      if (session?.payment_status === 'paid') return this.markPaid(orderId, session.payment_intent as string | null);
    }
    await this.endUnpaid(orderId, 'decline', 'payment_declined', 'The card was declined.');
  }

  async reconcileById(orderId: number): Promise<void> {
    const order = (await loadOrderRecord(this.db, orderId))?.order;
    if (order?.status === 'awaiting_payment') await this.reconcile(order);
  }

  /** Checks an unpaid order with the payment provider and applies what happened there. */
  async reconcile(order: OrderRow): Promise<void> {
    if (!order.checkoutSessionId) return;
    const session = await this.payments.retrieve(order.checkoutSessionId);
    if (session.payment_status === 'paid') await this.markPaid(order.id, session.payment_intent as string | null);
    else if (session.status === 'expired') await this.endUnpaid(order.id, 'expire', 'reservation_expired', 'The payment page expired.');
  }

  /**
   * Ends every hold whose time is up (a scheduled job; safe to run twice at once): a payment that did arrive is applied instead;
   * otherwise the payment page is closed and the bales go back on the lot. Returns how many holds ended.
   */
  async expireDueReservations(): Promise<number> {
    const now = this.deps.clock.now();
    const due = await this.db.select().from(orders).where(and(eq(orders.status, 'awaiting_payment'), lte(orders.reservedUntil, now)));
    let ended = 0;
    for (const order of due) {
      try {
        const session = order.checkoutSessionId ? await this.payments.close(order.checkoutSessionId) : null;
        if (session?.payment_status === 'paid') {
          await this.markPaid(order.id, session.payment_intent as string | null);
          continue;
        }
        if (await this.endUnpaid(order.id, 'expire', 'reservation_expired', `Unpaid after ${RESERVATION_MINUTES} minutes; the bales went back on the lot.`)) ended++;
      } catch (err) {
        // The provider is unreachable: keep the hold and try again on the next run rather than guess.
        this.deps.logger.warn({ err, orderId: order.id }, 'could not end an expired hold yet');
      }
    }
    return ended;
  }

  /** Refunds `amountCents` once for a given key: the key is stored first, so a repeat finds it and stops. */
  async refundOnce(order: OrderRow, amountCents: number, reason: string, key: string, paymentIntentId = order.paymentIntentId, createdBy: number | null = null): Promise<boolean> {
    if (amountCents <= 0 || !paymentIntentId) return false;
    const claimed = await this.db.transaction(async (tx) => {
      const inserted = await tx.insert(orderRefunds).values({ orderId: order.id, amountCents, reason, idempotencyKey: key, createdBy }).onConflictDoNothing().returning();
      if (inserted.length === 0) return false;
      await tx.update(orders).set({ refundedCents: sql`${orders.refundedCents} + ${amountCents}`, updatedAt: this.deps.clock.now() }).where(eq(orders.id, order.id));
      return true;
    });
    const [row] = await this.db.select().from(orderRefunds).where(eq(orderRefunds.idempotencyKey, key));
    if (row?.providerRefundId) return false;
    // Same key to the provider: a retry after a crash here refunds once there too.
    const refund = await this.payments.refund(paymentIntentId, row!.amountCents, key, { orderId: String(order.id), reason });
    await this.db.update(orderRefunds).set({ providerRefundId: refund.id }).where(eq(orderRefunds.idempotencyKey, key));
    return claimed;
  }

  /** Puts order e-mails in the outbox (the job queue sends and retries them); never undoes the order. */
  async notify(orderId: number, kinds: OrderMailKind[]): Promise<void> {
    const record = await loadOrderRecord(this.db, orderId);
    if (!record) return;
    for (const kind of kinds) {
      const to = kind === 'new_order' ? record.grower.email : record.buyer.email;
      try {
        await this.deps.jobs.enqueueMail(orderMail(kind, to, mailFacts(record), this.deps.env.PUBLIC_URL));
      } catch (err) {
        this.deps.logger.error({ err, orderId, kind }, 'order e-mail could not be queued');
      }
    }
  }

  private async endUnpaid(orderId: number, event: 'expire' | 'decline', reason: string, note: string): Promise<boolean> {
    return this.db.transaction(async (tx: Tx) => {
      const order = await lockOrder(tx, orderId);
      if (order?.status !== 'awaiting_payment') return false;
      await applyOrderEvent(tx, order, event, { actor: 'system', actorId: null }, this.deps.clock.now(), { cancelReason: reason, reservedUntil: null }, note);
      await releaseOrderStock(tx, orderId, this.deps.clock.now());
      return true;
    });
  }

  private async summaries(where: ReturnType<typeof eq>): Promise<OrderSummary[]> {
    const rows = await this.db
      .select({ order: orders, farm: farms, buyerName: users.displayName, delivery: deliveries })
      .from(orders)
      .innerJoin(farms, eq(farms.id, orders.farmId))
      .innerJoin(users, eq(users.id, orders.buyerId))
      .leftJoin(deliveries, and(eq(deliveries.orderId, orders.id), eq(deliveries.loadNumber, 1)))
      .where(where)
      .orderBy(desc(orders.createdAt), desc(orders.id))
      .limit(200);
    const lines = await linesOf(this.db, rows.map((r) => r.order.id));
    return rows.map((r) => {
      const mine = lines.filter((l) => l.line.orderId === r.order.id);
      const { bales, tons } = lineTotals(mine);
      return {
        id: r.order.id,
        status: r.order.status,
        bales,
        tons,
        totalCents: r.order.totalCents,
        method: r.order.method,
        createdAt: r.order.createdAt.toISOString(),
        lines: mine.map(lineView),
        farm: { id: r.farm.id, name: r.farm.name, city: r.farm.city, state: r.farm.state, pickupFromHour: r.farm.pickupFromHour, pickupToHour: r.farm.pickupToHour, timeZone: r.farm.timeZone },
        buyerName: r.buyerName,
        windowStart: r.delivery?.windowStart.toISOString() ?? null,
        deliveryStatus: r.delivery?.status ?? null,
      };
    });
  }

  private async listedLot(lotId: number) {
    const [row] = await this.db.select({ lot: lots, farm: farms }).from(lots).innerJoin(farms, eq(farms.id, lots.farmId)).where(eq(lots.id, lotId));
    if (!row || !['listed', 'sold_out'].includes(row.lot.status)) throw notFound('Lot');
    return row;
  }

  private distance(farm: typeof farms.$inferSelect, zip: string): number {
    const place = locateZip(zip);
    return round1(haversineMiles({ lat: farm.latitude, lon: farm.longitude }, { lat: place.latitude, lon: place.longitude }));
  }
}

/** One line of a checkout, checked against its lot. */
interface Checked {
  lot: typeof lots.$inferSelect;
  farm: typeof farms.$inferSelect;
  line: { lotId: number; bales: number };
  distanceMi: number | null;
  /** Where in the request a problem with it points. */
  path: string;
}

/** One grower's order checked and priced, before its bales are held. */
interface Draft {
  farm: typeof farms.$inferSelect;
  lines: Checked[];
  total: GrowerOrderTotal;
  distanceMi: number | null;
  window: { start: Date; end: Date } | null;
}

/** Lines grouped by the lot's farm, growers in the order they first appear. */
function groupByFarm<T extends { farm: { id: number } }>(items: readonly T[]): T[][] {
  const groups = new Map<number, T[]>();
  for (const item of items) groups.set(item.farm.id, [...(groups.get(item.farm.id) ?? []), item]);
  return [...groups.values()];
}

export function lotTerms(lot: typeof lots.$inferSelect): LotTerms {
  return {
    pricingUnit: lot.pricingUnit,
    priceCentsPerTon: lot.priceCentsPerTon,
    priceCentsPerBale: lot.priceCentsPerBale,
    avgBaleWeightLb: lot.avgBaleWeightLb,
    minOrderTons: lot.minOrderTons,
    balesAvailable: lot.balesAvailable,
    freightCentsPerLoadedMile: lot.freightCentsPerLoadedMile,
  };
}

export type { OrderRecord };
