import { eq } from 'drizzle-orm';
import { messages, users } from '../../db/schema';
import { createGrower, createLot, createOrder } from '../../../tests/support/fixtures';
import { signedInUser } from '../../../tests/support/grower-lot';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { queueMessageNotice } from './message-notices';

describe('messages about an order between its buyer and its grower', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  }, 30_000);
  afterAll(() => t.close());

  it('the buyer asks, the grower is e-mailed once and answers, the buyer is e-mailed; an admin reads without marking anything read', async () => {
    const { order, buyer, grower } = await anOrder('Order talk lot');
    t.mails.length = 0;

    const before = await buyer.agent.get(`/messages/orders/${order.id}`);
    expect(before.body).toEqual({ thread: null, mayWrite: true, whyNot: null });

    const asked = await buyer.agent.post(`/messages/orders/${order.id}`, { body: 'Can I come at 7 in the morning?\nThe trailer is 24 ft.' });
    expect(asked.status).toBe(201);
    expect(asked.body.thread).toMatchObject({ orderId: order.id, lotId: null, subject: `Order ${order.id}`, withName: grower.farm.name });
    expect(asked.body.thread.messages).toEqual([expect.objectContaining({ mine: true, body: 'Can I come at 7 in the morning?\nThe trailer is 24 ft.' })]);

    await t.drainJobs();
    // The job running again (a retry after a crash) must not send it twice.
    expect(await queueMessageNotice(t.deps, asked.body.thread.messages[0].id)).toBe('already-queued');
    await t.drainJobs();
    const toGrower = t.mails.filter((m) => m.to === grower.email);
    expect(toGrower).toHaveLength(1);
    expect(toGrower[0]!.subject).toBe(`The buyer wrote about order ${order.id}`);
    for (const part of [toGrower[0]!.text, toGrower[0]!.html!]) {
      expect(part).toContain('The trailer is 24 ft.');
      expect(part).toContain(`/orders/${order.id}#messages`);
    }

    const admin = await signedInUser(t, 'admin');
    const adminView = await admin.agent.get(`/messages/orders/${order.id}`);
    expect(adminView.status).toBe(200);
    expect(adminView.body).toMatchObject({ mayWrite: false, thread: { withName: `Order Buyer and ${grower.farm.name}` } });
    expect(adminView.body.thread.messages[0]).toMatchObject({ mine: false, readAt: null });
    expect((await admin.agent.post(`/messages/orders/${order.id}`, { body: 'Admin here' })).status).toBe(403);

    const growerInbox = await grower.agent.get('/messages/threads');
    expect(growerInbox.body.items).toEqual([expect.objectContaining({ orderId: order.id, subject: `Order ${order.id}`, withName: 'Order Buyer', unread: 1 })]);
    const answered = await grower.agent.post(`/messages/orders/${order.id}`, { body: 'Yes, 7 is fine. The gate code is on the order.' });
    expect(answered.status).toBe(201);
    expect(answered.body.thread.messages.map((m: { mine: boolean }) => m.mine)).toEqual([false, true]);
    expect((await grower.agent.get('/messages/threads')).body.items[0].unread).toBe(0);

    await t.drainJobs();
    const toBuyer = t.mails.filter((m) => m.to === buyer.email);
    expect(toBuyer).toHaveLength(1);
    expect(toBuyer[0]!.subject).toBe(`The grower wrote about order ${order.id}`);
    const buyerView = await buyer.agent.get(`/messages/orders/${order.id}`);
    expect(buyerView.body.thread.messages.map((m: { body: string }) => m.body)).toEqual(['Can I come at 7 in the morning?\nThe trailer is 24 ft.', 'Yes, 7 is fine. The gate code is on the order.']);
  });

  it('is the two parties’ only: strangers get 404, as for the order itself', async () => {
    const { order, buyer } = await anOrder('Private order lot');
    await buyer.agent.post(`/messages/orders/${order.id}`, { body: 'Hello' });
    const otherBuyer = await signedInUser(t, 'buyer');
    const otherGrower = await signedInUser(t, 'grower');
    for (const stranger of [otherBuyer, otherGrower]) {
      expect((await stranger.agent.get(`/messages/orders/${order.id}`)).status).toBe(404);
      expect((await stranger.agent.post(`/messages/orders/${order.id}`, { body: 'Me too' })).status).toBe(404);
    }
    expect((await buyer.agent.get('/messages/orders/2000000000')).status).toBe(404);
    expect((await t.agent().get(`/messages/orders/${order.id}`)).status).toBe(401);
  });

  it('refuses empty, overlong and control-character messages with 400, and writing before the order is paid with 409', async () => {
    const { order, buyer, grower, lot, buyerId } = await anOrder('Bad input order lot');
    for (const body of ['   ', 'x'.repeat(2001), 'Bell\u0007', 'NUL\u0000byte', 'Escape\u001b[31m', 'Right-to-left \u202Eoverride']) {
      const res = await buyer.agent.post(`/messages/orders/${order.id}`, { body });
      expect(res.status).toBe(400);
      expect(res.body.error.message).toEqual(expect.any(String));
    }
    expect((await buyer.agent.post(`/messages/orders/${order.id}`, { body: 'Hi', extra: 1 })).status).toBe(400);
    expect((await buyer.agent.post('/messages/orders/abc', { body: 'Hi' })).status).toBe(400);
    // 2,000 characters is the limit, not over it.
    expect((await buyer.agent.post(`/messages/orders/${order.id}`, { body: 'y'.repeat(2000) })).status).toBe(201);

    const unpaid = await createOrder(t.deps.db, { buyerId, farmId: grower.farm.id, lotId: lot.id, paid: false });
    const refused = await buyer.agent.post(`/messages/orders/${unpaid.id}`, { body: 'Hello' });
    expect(refused.status).toBe(409);
    expect((await buyer.agent.get(`/messages/orders/${unpaid.id}`)).body).toMatchObject({ thread: null, mayWrite: false, whyNot: expect.stringContaining('paid') });
  });

  it('buyer and grower writing first at the same moment share the order’s one thread (unique in PostgreSQL)', async () => {
    const { order, buyer, grower } = await anOrder('Race order lot');
    const [a, b] = await Promise.all([buyer.agent.post(`/messages/orders/${order.id}`, { body: 'From the buyer' }), grower.agent.post(`/messages/orders/${order.id}`, { body: 'From the grower' })]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.thread.id).toBe(b.body.thread.id);
    const stored = await t.deps.db.select().from(messages).where(eq(messages.threadId, a.body.thread.id));
    expect(stored).toHaveLength(2);
  });

  /** A paid order from a fixture grower's lot to a signed-in buyer, with the grower signed in too. */
  async function anOrder(title: string) {
    const growerRow = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, growerRow.farm.id, { title });
    const buyer = await signedInUser(t, 'buyer');
    const [buyerRow] = await t.deps.db.update(users).set({ displayName: 'Order Buyer' }).where(eq(users.email, buyer.email)).returning({ id: users.id });
    const order = await createOrder(t.deps.db, { buyerId: buyerRow!.id, farmId: growerRow.farm.id, lotId: lot.id });
    const agent = t.agent();
    expect((await agent.post('/auth/sign-in', { email: growerRow.email, password: growerRow.password })).status).toBe(200);
    return { order, lot, buyer, buyerId: buyerRow!.id, grower: { ...growerRow, agent } };
  }
});
