import { eq } from 'drizzle-orm';
import { TEST_CARD_DECLINED, TEST_CARD_OK } from '../docker-local-fakes/stripe/stripe-fake';
import { farms, lots, orderEvents, orderLines, orderRefunds, orders, users } from '../server/db/schema';
import { hashPassword } from '../server/features/auth/password';
import { OrdersService } from '../server/features/orders/orders.service';
import { deliverOrderEvents, payOnPage } from './support/checkout-payments';
import { createGrower, createLot } from './support/fixtures';
import { holdSettings } from './support/settings-lock';
import { startStripeFake, startTestApi, uniqueEmail, type StripeFakeServer, type TestApi } from './support/test-api';

jest.setTimeout(60_000);

const passwordHash = hashPassword('fixture-password');

/** A signed-in user of a role; one password hash shared, so twenty buyers sign up quickly. */
async function signedInUser(api: TestApi, role: 'buyer' | 'grower' | 'admin') {
  const email = uniqueEmail(role);
  await api.deps.db.insert(users).values({ email, displayName: `Fixture ${role}`, role, passwordHash: await passwordHash });
  const agent = api.agent();
  const res = await agent.post('/auth/sign-in', { email, password: 'fixture-password' });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return { email, agent };
}

/**
 * Buying a load end to end against PostgreSQL and the Stripe fake (issue 10 "done means"): stock is held
 * at checkout, committed on payment, released on decline, cancel or expiry; webhooks are verified and
 * idempotent; a short scale ticket refunds the difference once.
 */
describe('buying a load', () => {
  let stripe: StripeFakeServer;
  let t: TestApi;
  beforeAll(async () => {
    stripe = await startStripeFake();
    t = await startTestApi({}, { stripe });
  });
  afterAll(async () => {
    await t.close();
    await stripe.close();
  });
  // Totals here are at the default 3 % fee: no other file may change the settings mid-test.
  let releaseSettings: () => Promise<void>;
  beforeEach(async () => {
    releaseSettings = await holdSettings('read');
  });
  afterEach(() => releaseSettings());

  /** A listed lot of 60 lb bales at $300/t, picked up at the farm (no freight). */
  async function lotWith(bales: number, opts: { freight?: number } = {}) {
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Test alfalfa' });
    await t.deps.db.update(lots).set({ baleCount: Math.max(400, bales), balesAvailable: bales, freightCentsPerLoadedMile: opts.freight ?? null }).where(eq(lots.id, lot.id));
    return { grower, lot };
  }
  const balesLeft = async (lotId: number) => (await t.deps.db.select().from(lots).where(eq(lots.id, lotId)))[0]!.balesAvailable;
  const orderRow = async (id: number) => (await t.deps.db.select().from(orders).where(eq(orders.id, id)))[0]!;
  const pay = payOnPage;
  const deliverEvents = (orderId: number, api: TestApi = t) => deliverOrderEvents(stripe, orderId, api);

  it('places an order: 201 with the total and a payment page, and the bales are held', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const res = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup' });
    expect(res.status).toBe(201);
    // 100 bales × 60 lb = 3 t at $300/t = $900, plus the 3 % fee ($27): $927.
    expect(res.body).toMatchObject({ status: 'awaiting_payment', totalCents: 92_700 });
    expect(res.body.paymentUrl).toMatch(new RegExp(`^${stripe.base}/fake/pay/cs_test_`));
    expect(await balesLeft(lot.id)).toBe(300);
  });

  it('shows an order to its buyer, its grower and admins, and answers 404 to anyone else', async () => {
    const { lot, grower } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 50, method: 'pickup' });
    const growerAgent = t.agent();
    await growerAgent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    expect((await buyer.agent.get(`/orders/${body.id}`)).status).toBe(200);
    expect((await growerAgent.get(`/orders/${body.id}`)).status).toBe(200);
    expect((await (await signedInUser(t, 'admin')).agent.get(`/orders/${body.id}`)).status).toBe(200);
    expect((await (await signedInUser(t, 'buyer')).agent.get(`/orders/${body.id}`)).status).toBe(404);
    expect((await (await signedInUser(t, 'grower')).agent.get(`/orders/${body.id}`)).status).toBe(404);
  });

  it('refuses bad input with a clear 400 and a lot that is not for sale with 404', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const noZip = await buyer.agent.post('/orders', { lotId: lot.id, bales: 50, method: 'delivery' });
    expect(noZip.status).toBe(400);
    expect(JSON.stringify(noZip.body)).toMatch(/ZIP/);
    expect((await buyer.agent.post('/orders', { lotId: lot.id, bales: 0, method: 'pickup' })).status).toBe(400);
    expect((await buyer.agent.post('/orders', { lotId: 999_999, bales: 5, method: 'pickup' })).status).toBe(404);
  });

  it('marks the order paid when the signed webhook arrives; the same event twice changes nothing', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup' });
    const paid = await pay(body.paymentUrl, TEST_CARD_OK);
    expect(paid.status).toBe(303);
    await t.drainJobs();
    const mailsBefore = t.mails.length;
    const first = await deliverEvents(body.id);
    expect(first.every((r) => r.status === 200)).toBe(true);
    const again = await deliverEvents(body.id);
    expect(again.map((r) => r.body.outcome)).toEqual(first.map(() => 'duplicate'));
    const order = await orderRow(body.id);
    expect(order.status).toBe('paid');
    expect(order.paymentIntentId).toMatch(/^pi_/);
    expect(await balesLeft(lot.id)).toBe(300);
    const pays = await t.deps.db.select().from(orderEvents).where(eq(orderEvents.orderId, body.id));
    expect(pays.filter((e) => e.event === 'pay')).toHaveLength(1);
    // One "paid" e-mail to the buyer and one "new order" to the grower, not four.
    await t.drainJobs();
    expect(t.mails.length - mailsBefore).toBe(2);
  });

  it('rejects a webhook whose signature does not match', async () => {
    const res = await t.agent().raw.post('/payments/webhook').set('content-type', 'application/json').set('stripe-signature', 't=1,v1=bad').send('{"id":"evt_x"}');
    expect(res.status).toBe(400);
  });

  it('a declined card leaves the stock untouched: the order ends and the bales go back', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 120, method: 'pickup' });
    const declined = await pay(body.paymentUrl, TEST_CARD_DECLINED);
    expect(declined.status).toBe(402);
    await deliverEvents(body.id);
    expect(await orderRow(body.id)).toMatchObject({ status: 'cancelled', cancelReason: 'payment_declined' });
    expect(await balesLeft(lot.id)).toBe(400);
    // The payment page is closed, so the order cannot be paid later by mistake.
    expect((await pay(body.paymentUrl, TEST_CARD_OK)).status).toBe(410);
  });

  it('20 concurrent checkouts for the last load give exactly one reservation and 19 clear 409s', async () => {
    const { lot } = await lotWith(40);
    const buyers = await Promise.all(Array.from({ length: 20 }, () => signedInUser(t, 'buyer')));
    const results = await Promise.all(buyers.map((b) => b.agent.post('/orders', { lotId: lot.id, bales: 40, method: 'pickup' })));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    // A loser either lost the hold itself or, arriving after the winner's commit, read a lot with none left: both say so.
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.error.message).toMatch(/no longer available|no bales left/);
    expect(await balesLeft(lot.id)).toBe(0);
    const held = await t.deps.db.select().from(orderLines).where(eq(orderLines.lotId, lot.id));
    expect(held).toHaveLength(1);
    expect((await t.deps.db.select().from(lots).where(eq(lots.id, lot.id)))[0]!.status).toBe('sold_out');
  });

  it('the buyer cancels an unpaid order and the bales go back on the lot', async () => {
    const { lot } = await lotWith(40);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 40, method: 'pickup' });
    const cancelled = await buyer.agent.post(`/orders/${body.id}/cancel`, {});
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    expect(await balesLeft(lot.id)).toBe(40);
    expect((await t.deps.db.select().from(lots).where(eq(lots.id, lot.id)))[0]!.status).toBe('listed');
    expect((await buyer.agent.post(`/orders/${body.id}/cancel`, {})).status).toBe(409);
  });

  it('an expired reservation releases its stock and closes the payment page', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 200, method: 'pickup' });
    const service = new OrdersService(t.deps);
    expect(await service.expireDueReservations()).toBe(0);
    t.clock.set(new Date(t.clock.now().getTime() + 31 * 60_000));
    try {
      expect(await service.expireDueReservations()).toBeGreaterThanOrEqual(1);
    } finally {
      t.clock.set(new Date(t.clock.now().getTime() - 31 * 60_000));
    }
    expect(await orderRow(body.id)).toMatchObject({ status: 'expired', cancelReason: 'reservation_expired' });
    expect(await balesLeft(lot.id)).toBe(400);
    expect((await pay(body.paymentUrl, TEST_CARD_OK)).status).toBe(410);
  });

  it('an app restart between payment and webhook loses nothing', async () => {
    const { lot } = await lotWith(400);
    const first = await startTestApi({}, { stripe });
    const buyer = await signedInUser(first, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup' });
    await pay(body.paymentUrl, TEST_CARD_OK);
    await first.close(); // down before any webhook arrived

    const second = await startTestApi({}, { stripe });
    try {
      expect((await orderRow(body.id)).status).toBe('awaiting_payment');
      // The provider retries its webhook once the app is back.
      const answers = await deliverEvents(body.id, second);
      expect(answers.every((r) => r.status === 200)).toBe(true);
      expect((await orderRow(body.id)).status).toBe('paid');
      expect(await balesLeft(lot.id)).toBe(300);
    } finally {
      await second.close();
    }
  });

  it('a paid order is found even if its webhook never comes: reading it checks with the provider', async () => {
    const { lot } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 10, method: 'pickup' });
    await pay(body.paymentUrl, TEST_CARD_OK);
    const seen = await buyer.agent.get(`/orders/${body.id}`);
    expect(seen.body.status).toBe('paid');
    expect(seen.body.timeline.map((e: { event: string }) => e.event)).toEqual(['place', 'pay']);
  });

  it('a scale ticket below the paid tons refunds the difference once', async () => {
    const { lot, grower } = await lotWith(800);
    const buyer = await signedInUser(t, 'buyer');
    // 800 bales × 60 lb = 24 t at $300/t = $7,200 + 3 % fee $216.
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 800, method: 'pickup', window: { date: '2026-09-17', pickupHour: 9 } });
    expect(body.totalCents).toBe(720_000 + 21_600);
    await pay(body.paymentUrl, TEST_CARD_OK);
    await deliverEvents(body.id);
    const growerAgent = t.agent();
    await growerAgent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    const confirmed = await growerAgent.post(`/orders/${body.id}/confirm-date`, {});
    expect(confirmed.status).toBe(200);
    expect(confirmed.body).toMatchObject({ status: 'scheduled', delivery: { status: 'confirmed' } });

    const handed = await growerAgent.post(`/orders/${body.id}/hand-over`, { weighedTons: 23.5 });
    expect(handed.status).toBe(200);
    // Half a ton short at $300/t: $150 of hay and $4.50 of fee come back.
    expect(handed.body).toMatchObject({ status: 'delivered', lines: [expect.objectContaining({ weighedTons: 23.5 })], refundedCents: 15_000 + 450 });
    expect((await growerAgent.post(`/orders/${body.id}/hand-over`, { weighedTons: 23.5 })).status).toBe(409);
    const service = new OrdersService(t.deps);
    const order = await orderRow(body.id);
    expect(await service.refundOnce(order, 15_450, 'scale_ticket', `order-${body.id}-scale-ticket`)).toBe(false);
    const refunds = await t.deps.db.select().from(orderRefunds).where(eq(orderRefunds.orderId, body.id));
    expect(refunds).toHaveLength(1);
    expect(refunds[0]!.providerRefundId).toMatch(/^re_/);
    const atProvider = stripe.fake.events().filter((e) => e['type'] === 'charge.refunded' && JSON.stringify(e).includes(String(order.paymentIntentId)));
    expect(atProvider).toHaveLength(1);

    const accepted = await buyer.agent.post(`/orders/${body.id}/accept`, {});
    expect(accepted.body.status).toBe('completed');
    await t.drainJobs();
    expect(t.mails.some((m) => m.subject === `Receipt for order ${body.id}` && m.text.includes('Refunded: $154.50'))).toBe(true);
  });

  it('never charges more: a scale ticket above the paid tons refunds nothing', async () => {
    const { lot, grower } = await lotWith(400);
    const buyer = await signedInUser(t, 'buyer');
    const { body } = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup', window: { date: '2026-09-17', pickupHour: 10 } });
    await pay(body.paymentUrl, TEST_CARD_OK);
    await deliverEvents(body.id);
    const growerAgent = t.agent();
    await growerAgent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    await growerAgent.post(`/orders/${body.id}/confirm-date`, {});
    const handed = await growerAgent.post(`/orders/${body.id}/hand-over`, { weighedTons: 3.4 });
    expect(handed.body).toMatchObject({ status: 'delivered', refundedCents: 0, totalCents: body.totalCents });
  });

  it('prices delivery with whole-load freight at the grower rate from the farm to the ZIP', async () => {
    const { lot, grower } = await lotWith(400, { freight: 350 });
    const farm = (await t.deps.db.select().from(farms).where(eq(farms.id, grower.farm.id)))[0]!;
    const quote = await t.agent().get(`/orders/quote?lotId=${lot.id}&bales=100&method=delivery&deliveryZip=66502`);
    expect(quote.status).toBe(200);
    // Same ZIP as the farm: distance ≈ 0; the freight is rate × miles × 1 load.
    expect(quote.body.loads).toBe(1);
    expect(quote.body.freightCents).toBe(Math.round(350 * quote.body.distanceMi));
    expect(farm.zip).toBe('66502');
  });
});
