import { eq, inArray } from 'drizzle-orm';
import { TEST_CARD_DECLINED, TEST_CARD_OK } from '../docker-local-fakes/stripe/stripe-fake';
import { lots, orderEvents, orderLines, orderRefunds, orders, qualityClaims } from '../server/db/schema';
import { OrdersService } from '../server/features/orders/orders.service';
import { deliverOrderEvents, payOnPage } from './support/checkout-payments';
import { createGrower, createLot } from './support/fixtures';
import { signedInUser } from './support/grower-lot';
import { startCheckoutApi } from './support/checkout-api';
import type { StripeFakeServer, TestApi } from './support/test-api';

jest.setTimeout(120_000);

/**
 * One order per grower, several lots on its lines, against PostgreSQL and the Stripe fake: each line's
 * bales are held, sold or given back together; freight is one trip; the scale ticket settles per line.
 */
describe('an order of several lots from one grower', () => {
  let stripe: StripeFakeServer;
  let t: TestApi;
  let close: () => Promise<void>;
  beforeAll(async () => {
    // Totals here are at the default 3 % fee: no other file may change the settings meanwhile.
    ({ t, stripe, close } = await startCheckoutApi());
  });
  afterAll(() => close());

  /** A grower with two listed lots of 60 lb bales at $300/t (fixture), `bales` left in each. */
  async function growerWithTwoLots(bales: [number, number], opts: { freight?: number } = {}) {
    const grower = await createGrower(t.deps.db);
    const made = [];
    for (const [i, title] of ['Two-lot timothy', 'Two-lot alfalfa'].entries()) {
      const lot = await createLot(t.deps.db, grower.farm.id, { title });
      await t.deps.db.update(lots).set({ baleCount: 1000, balesAvailable: bales[i]!, freightCentsPerLoadedMile: opts.freight ?? null }).where(eq(lots.id, lot.id));
      made.push(lot);
    }
    return { grower, a: made[0]!, b: made[1]! };
  }
  const balesLeft = async (ids: number[]) => {
    const rows = await t.deps.db.select({ id: lots.id, n: lots.balesAvailable }).from(lots).where(inArray(lots.id, ids));
    return ids.map((id) => rows.find((r) => r.id === id)!.n);
  };
  const orderRow = async (id: number) => (await t.deps.db.select().from(orders).where(eq(orders.id, id)))[0]!;
  async function checkout(agent: TestApi['agent'] extends () => infer A ? A : never, lines: { lotId: number; bales: number }[], how: object = { method: 'pickup' }) {
    const res = await agent.post('/orders/from-list', { ...how, lines });
    if (res.status !== 201) throw new Error(`checkout failed: ${res.status} ${JSON.stringify(res.body)}`);
    expect(res.body.orders).toHaveLength(1);
    return res.body.orders[0] as { id: number; totalCents: number; paymentUrl: string };
  }

  it('holds both lines, sells both on payment, and a webhook delivered twice changes nothing', async () => {
    const { a, b } = await growerWithTwoLots([400, 400]);
    const buyer = await signedInUser(t, 'buyer');
    const order = await checkout(buyer.agent, [{ lotId: a.id, bales: 100 }, { lotId: b.id, bales: 200 }]);
    // 3 t + 6 t at $300/t = $2,700, fee 3 % = $81 (fixture prices; fee is our own default).
    expect(order.totalCents).toBe(270_000 + 8_100);
    expect(await balesLeft([a.id, b.id])).toEqual([300, 200]);
    expect(await t.deps.db.select().from(orderLines).where(eq(orderLines.orderId, order.id))).toHaveLength(2);

    expect((await payOnPage(order.paymentUrl, TEST_CARD_OK)).status).toBe(303);
    const first = await deliverOrderEvents(stripe, order.id, t);
    const again = await deliverOrderEvents(stripe, order.id, t);
    expect(again.map((r) => r.body.outcome)).toEqual(first.map(() => 'duplicate'));
    expect((await orderRow(order.id)).status).toBe('paid');
    expect(await balesLeft([a.id, b.id])).toEqual([300, 200]);
    const pays = await t.deps.db.select().from(orderEvents).where(eq(orderEvents.orderId, order.id));
    expect(pays.filter((e) => e.event === 'pay')).toHaveLength(1);
  });

  it('a declined card gives back the bales of every line', async () => {
    const { a, b } = await growerWithTwoLots([400, 400]);
    const buyer = await signedInUser(t, 'buyer');
    const order = await checkout(buyer.agent, [{ lotId: a.id, bales: 120 }, { lotId: b.id, bales: 80 }]);
    expect(await balesLeft([a.id, b.id])).toEqual([280, 320]);
    expect((await payOnPage(order.paymentUrl, TEST_CARD_DECLINED)).status).toBe(402);
    await deliverOrderEvents(stripe, order.id, t);
    expect(await orderRow(order.id)).toMatchObject({ status: 'cancelled', cancelReason: 'payment_declined' });
    expect(await balesLeft([a.id, b.id])).toEqual([400, 400]);
  });

  it('an expired hold gives back the bales of every line, and a lot it had sold out goes back on sale', async () => {
    const { a, b } = await growerWithTwoLots([400, 50]);
    const buyer = await signedInUser(t, 'buyer');
    const order = await checkout(buyer.agent, [{ lotId: a.id, bales: 200 }, { lotId: b.id, bales: 50 }]);
    expect((await t.deps.db.select().from(lots).where(eq(lots.id, b.id)))[0]!.status).toBe('sold_out');
    const service = new OrdersService(t.deps);
    t.clock.set(new Date(t.clock.now().getTime() + 31 * 60_000));
    try {
      expect(await service.expireDueReservations()).toBeGreaterThanOrEqual(1);
    } finally {
      t.clock.set(new Date(t.clock.now().getTime() - 31 * 60_000));
    }
    expect(await orderRow(order.id)).toMatchObject({ status: 'expired' });
    expect(await balesLeft([a.id, b.id])).toEqual([400, 50]);
    expect((await t.deps.db.select().from(lots).where(eq(lots.id, b.id)))[0]!.status).toBe('listed');
    expect((await payOnPage(order.paymentUrl, TEST_CARD_OK)).status).toBe(410);
  });

  it('two lines of one order compete with other buyers for the same two lots: 10 concurrent checkouts, one wins, nothing oversold', async () => {
    const { a, b } = await growerWithTwoLots([100, 100]);
    const buyers = await Promise.all(Array.from({ length: 10 }, () => signedInUser(t, 'buyer')));
    // Half the lists name the lots in the other order: holds are taken in lot order, so none waits on another forever.
    const results = await Promise.all(
      buyers.map((u, i) => u.agent.post('/orders/from-list', { method: 'pickup', lines: i % 2 ? [{ lotId: b.id, bales: 60 }, { lotId: a.id, bales: 60 }] : [{ lotId: a.id, bales: 60 }, { lotId: b.id, bales: 60 }] })),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(9);
    expect(await balesLeft([a.id, b.id])).toEqual([40, 40]);
    const lines = await t.deps.db.select().from(orderLines).where(inArray(orderLines.lotId, [a.id, b.id]));
    expect(lines).toHaveLength(2);
    expect(new Set(lines.map((l) => l.orderId)).size).toBe(1);
  });

  it('freight is one trip for the grower’s lots: 3 t + 6 t fit one load, charged once at $3.50 a loaded mile', async () => {
    const { a, b } = await growerWithTwoLots([400, 400], { freight: 350 });
    const buyer = await signedInUser(t, 'buyer');
    // Delivered to the farm's own ZIP: a short estimate, but the same distance for either way of ordering.
    const how = { method: 'delivery', deliveryZip: '66502', deliveryAddress: '12 Test Lane, Manhattan KS' };
    const quote = await buyer.agent.post('/orders/quote-list', { method: 'delivery', deliveryZip: '66502', lines: [{ lotId: a.id, bales: 100 }, { lotId: b.id, bales: 200 }] });
    expect(quote.status).toBe(200);
    const [grower] = quote.body.growers;
    expect(grower.loads).toBe(1);
    const single = await buyer.agent.get(`/orders/quote?lotId=${a.id}&bales=100&method=delivery&deliveryZip=66502`);
    // One load either way (domain brief §11: rate × miles × loads), so the two-lot order pays one lot's freight, not two.
    expect(grower.freightCents).toBe(single.body.freightCents);
    const order = await checkout(buyer.agent, [{ lotId: a.id, bales: 100 }, { lotId: b.id, bales: 200 }], how);
    expect(order.totalCents).toBe(grower.totalCents);
    expect(await orderRow(order.id)).toMatchObject({ loads: 1, freightCents: grower.freightCents });
  });

  it('a scale ticket short on one line refunds that line’s missing hay and its fee, once', async () => {
    const { grower, a, b } = await growerWithTwoLots([800, 800]);
    const buyer = await signedInUser(t, 'buyer');
    // 400 bales × 60 lb = 12 t per line at $300/t = $3,600 each; fee 3 % of $7,200 = $216.
    const order = await checkout(buyer.agent, [{ lotId: a.id, bales: 400 }, { lotId: b.id, bales: 400 }]);
    expect(order.totalCents).toBe(720_000 + 21_600);
    await payOnPage(order.paymentUrl, TEST_CARD_OK);
    await deliverOrderEvents(stripe, order.id, t);
    const farmer = t.agent();
    await farmer.post('/auth/sign-in', { email: grower.email, password: grower.password });
    expect((await buyer.agent.put(`/orders/${order.id}/window`, { date: '2026-09-17', pickupHour: 9 })).status).toBe(200);
    expect((await farmer.post(`/orders/${order.id}/confirm-date`, {})).status).toBe(200);
    const view = (await farmer.get(`/orders/${order.id}`)).body as { lines: { id: number; lot: { id: number } }[] };
    const lineA = view.lines.find((l) => l.lot.id === a.id)!.id;
    const lineB = view.lines.find((l) => l.lot.id === b.id)!.id;

    // One weight for an order of two ton-priced lots is refused: which lot was short?
    const vague = await farmer.post(`/orders/${order.id}/hand-over`, { weighedTons: 23.5 });
    expect(vague.status).toBe(400);
    const handed = await farmer.post(`/orders/${order.id}/hand-over`, { lines: [{ lineId: lineA, weighedTons: 11.5 }, { lineId: lineB, weighedTons: 12.4 }] });
    expect(handed.status).toBe(200);
    // Half a ton short on line A at $300/t: $150 of hay and 3 % of it, $4.50; line B over weight costs nothing more.
    expect(handed.body.refundedCents).toBe(15_000 + 450);
    expect(handed.body.lines.map((l: { weighedTons: number }) => l.weighedTons).sort()).toEqual([11.5, 12.4]);
    expect((await farmer.post(`/orders/${order.id}/hand-over`, { lines: [{ lineId: lineA, weighedTons: 11 }] })).status).toBe(409);
    const refunds = await t.deps.db.select().from(orderRefunds).where(eq(orderRefunds.orderId, order.id));
    expect(refunds).toHaveLength(1);
    expect(refunds[0]!.amountCents).toBe(15_450);
    const o = await orderRow(order.id);
    const atProvider = stripe.fake.events().filter((e) => e['type'] === 'charge.refunded' && JSON.stringify(e).includes(String(o.paymentIntentId)));
    expect(atProvider).toHaveLength(1);

    // A claim about this order names the lot it is about; a retest without naming one is refused.
    const retest = { labName: 'Invented Forage Lab', labCertified: true, reportDate: '2026-09-18', values: { basis: 'dm', dm: 88, cp: 14, adf: 35, ndf: 45 } };
    const unnamed = await buyer.agent.post('/claims', { orderId: order.id, reason: 'The second lot was mouldy inside the bales.', retest });
    expect(unnamed.status).toBe(400);
    expect(unnamed.body.error.code).toBe('name_the_lot');
    const named = await buyer.agent.post('/claims', { orderId: order.id, lineId: lineB, reason: 'The second lot was mouldy inside the bales.' });
    expect(named.status).toBe(201);
    expect(named.body).toMatchObject({ lineId: lineB, lotId: b.id, lotTitle: 'Two-lot alfalfa' });
    expect((await t.deps.db.select().from(qualityClaims).where(eq(qualityClaims.orderId, order.id)))[0]!.orderLineId).toBe(lineB);
  });
});
