import { randomUUID } from 'node:crypto';
import { and, asc, eq, inArray } from 'drizzle-orm';
import Stripe from 'stripe';
import { auditEvents, payouts } from '../../db/schema';
import type { TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';
import { deliveredOrder, finishPayoutSetup, growerWithPayouts, platformBalance } from '../../../tests/support/paid-orders';
import { PayoutsService } from './payouts.service';
import { plusDays } from '@shared/time/days';


describe('payout settlement', () => {
  let t: TestApi;
  let admin: SignedInUser;
  beforeAll(async () => {
    ({ t, admin } = await startAdminApi());
  });
  afterAll(() => t.close());

  const now = () => t.clock.now().getTime();
  /** Three growers with one accepted order each: $1,000 + $1,500 + $2,000 of hay, $50 freight each. */
  async function threeGrowers() {
    const growers = [];
    for (const goods of [100_000, 150_000, 200_000]) {
      const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
      await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: goods, freightCents: 5_000, deliveredAt: plusDays(new Date(now()), -5), acceptBy: plusDays(new Date(now()), -2) });
      growers.push(g);
    }
    return growers;
  }
  const batchFor = async (farmIds: number[], requestKey = randomUUID()) => {
    const res = await admin.agent.post('/admin/payouts/batches', { requestKey, farmIds });
    expect(res.status).toBe(201);
    return res.body as { id: number; totalCents: number; payouts: { id: number; farmId: number; amountCents: number; status: string }[] };
  };
  const sentTransfers = async (batchId: number) => (await t.deps.db.select().from(payouts).where(eq(payouts.batchId, batchId)).orderBy(asc(payouts.id))).map((p) => [p.status, p.transferId]);

  it('lists what is due: accepted or past the acceptance date, net of refunds; the platform fee stays with the platform', async () => {
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: 80_000, freightCents: 2_000, feeCents: 2_400, deliveredAt: plusDays(new Date(now()), -6), acceptBy: plusDays(new Date(now()), -3), status: 'delivered' });
    await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: 50_000, deliveredAt: plusDays(new Date(now()), -1), acceptBy: plusDays(new Date(now()), 2), status: 'delivered' });
    const due = (await admin.agent.get('/admin/payouts/due')).body.items.find((i: { farmId: number }) => i.farmId === g.farm.id);
    // 800.00 hay + 20.00 freight; the 24.00 fee was paid by the buyer on top. The second order is still inside its acceptance window.
    expect(due).toMatchObject({ ready: true, heldReason: null, totalCents: 82_000, orders: [expect.objectContaining({ amountCents: 82_000, platformFeeCents: 2_400 })] });
  });

  it('a double submit of the same review makes one batch', async () => {
    const growers = await threeGrowers();
    const key = randomUUID();
    const [a, b] = await Promise.all([batchFor(growers.map((g) => g.farm.id), key), batchFor(growers.map((g) => g.farm.id), key)]);
    expect(a.id).toBe(b.id);
    expect(a.payouts.map((p) => p.amountCents).sort()).toEqual([105_000, 155_000, 205_000]);
  });

  it('pays each grower exactly once when settle is submitted twice at the same time, and again later', async () => {
    const growers = await threeGrowers();
    const batch = await batchFor(growers.map((g) => g.farm.id));
    const before = await platformBalance(t.deps.stripe);
    const [r1, r2] = await Promise.all([admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`), admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`)]);
    expect([r1.status, r2.status]).toEqual([200, 200]);
    expect((await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`)).status).toBe(200);
    expect(before - (await platformBalance(t.deps.stripe))).toBe(105_000 + 155_000 + 205_000);
    const rows = await sentTransfers(batch.id);
    expect(rows.every(([status, id]) => status === 'sent' && typeof id === 'string')).toBe(true);
    expect(new Set(rows.map(([, id]) => id)).size).toBe(3);
    const sent = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.action, 'payout.sent'), inArray(auditEvents.entityId, batch.payouts.map((p) => String(p.id)))));
    expect(sent).toHaveLength(3);
    expect(sent[0]).toMatchObject({ before: { status: 'due' }, after: { status: 'sent' } });
  }, 60_000);

  it('resumes a batch after a crash between a transfer and its record, and pays nobody twice', async () => {
    const growers = await threeGrowers();
    const batch = await batchFor(growers.map((g) => g.farm.id));
    const before = await platformBalance(t.deps.stripe);
    // The provider makes the second transfer, then the server dies before the database records it.
    const made: string[] = [];
    let calls = 0;
    const crashing = stripeWith(t.deps.stripe, async (create, params, options) => {
      const transfer = await create(params, options);
      made.push(transfer.id);
      if (++calls === 2) throw new Error('the server process died here');
      return transfer;
    });
    const dying = new PayoutsService({ ...t.deps, stripe: crashing });
    await expect(dying.settle(null, batch.id)).rejects.toThrow('died');
    expect((await sentTransfers(batch.id)).map(([s]) => s)).toEqual(['sent', 'due', 'due']);

    // After a restart the admin settles the batch again.
    const res = await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    expect(res.status).toBe(200);
    expect(res.body.settledAt).toBe(t.clock.now().toISOString());
    const rows = await sentTransfers(batch.id);
    expect(rows.map(([s]) => s)).toEqual(['sent', 'sent', 'sent']);
    // The second payout is the transfer made before the crash, not a new one.
    expect(rows[1]![1]).toBe(made[1]);
    expect(before - (await platformBalance(t.deps.stripe))).toBe(105_000 + 155_000 + 205_000);
  }, 60_000);

  it('retries a request whose answer was lost under the same key, so the transfer is made once', async () => {
    const [g] = await threeGrowers();
    const batch = await batchFor([g!.farm.id]);
    const before = await platformBalance(t.deps.stripe);
    const lossy = stripeWith(t.deps.stripe, async (create, params, options) => {
      await create(params, options);
      throw new Stripe.errors.StripeConnectionError({ message: 'socket hang up' });
    });
    await expect(new PayoutsService({ ...t.deps, stripe: lossy }).settle(null, batch.id)).rejects.toMatchObject({ status: 502 });
    expect((await sentTransfers(batch.id))[0]![0]).toBe('due');
    await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    expect((await sentTransfers(batch.id))[0]![0]).toBe('sent');
    expect(before - (await platformBalance(t.deps.stripe))).toBe(105_000);
  }, 60_000);

  it('holds a grower without finished payout set-up, with the reason, and pays once set-up is done', async () => {
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe, false);
    await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: 60_000, deliveredAt: plusDays(new Date(now()), -5), acceptBy: plusDays(new Date(now()), -2) });
    const batch = await batchFor([g.farm.id]);
    expect(batch.payouts[0]).toMatchObject({ status: 'held', heldReason: expect.stringMatching(/not finished/) });
    const settled = await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    expect(settled.body.payouts[0].status).toBe('held');
    const link = await t.deps.stripe.accountLinks.create({ account: g.accountId, type: 'account_onboarding', return_url: 'http://127.0.0.1/done', refresh_url: 'http://127.0.0.1/again' });
    await fetch(link.url, { redirect: 'manual' });
    await finishPayoutSetup(t.deps.db, g.farm.id, g.accountId, true);
    const paid = await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    expect(paid.body.payouts[0]).toMatchObject({ status: 'sent', amountCents: 60_000 });
  }, 60_000);

  it('shows the grower their payout history and a CSV statement', async () => {
    const [g] = await threeGrowers();
    const batch = await batchFor([g!.farm.id]);
    await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    const grower = t.agent();
    await grower.post('/auth/sign-in', { email: g!.email, password: g!.password });
    const history = await grower.get('/payouts/mine');
    expect(history.body.items).toEqual([expect.objectContaining({ status: 'sent', amountCents: 105_000, lines: [expect.objectContaining({ goodsCents: 100_000, freightCents: 5_000 })] })]);
    const csv = await grower.get('/payouts/mine/statement.csv');
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text).toContain('payout,status,sent,order,item,hay,freight,refunded,amount,transfer');
    expect(csv.text).toMatch(/,order,1000\.00,50\.00,0\.00,1050\.00,tr_/);
  }, 60_000);
});

type Create = Stripe['transfers']['create'];
/** The real client, with transfers.create passed through `wrap` (to lose answers or die mid-batch). */
function stripeWith(stripe: Stripe, wrap: (create: Create, params: Parameters<Create>[0], options: Parameters<Create>[1]) => Promise<Stripe.Transfer>): Stripe {
  const create = stripe.transfers.create.bind(stripe.transfers) as Create;
  const transfers = { ...stripe.transfers, create: ((params: Parameters<Create>[0], options: Parameters<Create>[1]) => wrap(create, params, options)) as unknown as Create };
  return new Proxy(stripe, { get: (target, prop) => (prop === 'transfers' ? transfers : Reflect.get(target, prop)) });
}
