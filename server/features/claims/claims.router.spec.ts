import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { auditEvents, orders, payoutLines, storedFiles, users } from '../../db/schema';
import { PDF_MAX_BYTES } from '../uploads/upload-limits';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';
import { signedInUser } from '../../../tests/support/grower-lot';
import { deliveredOrder, growerWithPayouts, platformBalance } from '../../../tests/support/paid-orders';
import { holdSettings } from '../../../tests/support/settings-lock';
import { simplePdf } from '../../../tests/support/simple-pdf';
import { plusDays } from '@shared/time/days';

// The listing (tests/support/fixtures createLot): alfalfa, DM 88, CP 20, ADF 30, NDF 40 on DM.
const RETEST = { labName: 'Invented County Forage Lab', labCertified: true, reportDate: '2026-09-14', values: { basis: 'dm', dryMatterPct: 88, crudeProteinPct: 16.5, adfPct: 34.5, ndfPct: 46 } };

describe('quality claims', () => {
  let t: TestApi;
  let admin: SignedInUser;
  let buyer: SignedInUser;
  let buyerId: number;
  // The claim window and the tolerances come from the platform settings, which another file may change.
  let releaseSettings: () => Promise<void>;
  beforeAll(async () => {
    releaseSettings = await holdSettings('read');
    ({ t, admin } = await startAdminApi());
    buyer = await signedInUser(t, 'buyer');
    buyerId = (await buyer.agent.get('/auth/me')).body.user.id;
  });
  afterAll(async () => {
    await t.close();
    await releaseSettings();
  });

  const now = () => t.clock.now().getTime();
  const deliveredYesterday = async (farmId: number) =>
    deliveredOrder(t.deps.db, t.deps.stripe, farmId, { goodsCents: 120_000, freightCents: 10_000, feeCents: 3_600, status: 'delivered', deliveredAt: plusDays(new Date(now()), -1), acceptBy: plusDays(new Date(now()), 2), buyerId });

  it('lets the buyer report within the window with a retest, and nobody else', async () => {
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    const late = await deliveredTenDaysAgo(g.farm.id);
    expect((await buyer.agent.post('/claims', { orderId: late.id, reason: 'Dusty bales throughout the load.' })).status).toBe(409);
    const order = await deliveredYesterday(g.farm.id);
    const other = await signedInUser(t, 'buyer');
    expect((await other.agent.post('/claims', { orderId: order.id, reason: 'Not my order at all, though.' })).status).toBe(404);
    expect((await buyer.agent.post('/claims', { orderId: order.id, reason: 'short' })).status).toBe(400);
    const res = await buyer.agent.post('/claims', { orderId: order.id, reason: 'Leafless and stemmy; our lab found far less protein.', retest: RETEST });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'open', judgement: { outside: ['Crude protein (CP)', 'Acid detergent fibre (ADF)', 'Neutral detergent fibre (NDF)'] } });
    const [o] = await t.deps.db.select().from(orders).where(eq(orders.id, order.id));
    expect(o!.status).toBe('claimed');
    const token = await buyer.agent.token();
    const pdf = await buyer.agent.raw.post(`/claims/${res.body.id}/retest`).set('X-XSRF-TOKEN', token).attach('report', await simplePdf(['Retest', 'Crude protein 16.5 %']), 'retest.pdf');
    expect(pdf.status).toBe(201);
    expect(pdf.body.retest.reportUrl).toBe(`/api/claims/${res.body.id}/retest`);
    expect((await other.agent.get(`/claims/${res.body.id}`)).status).toBe(404);
    // A stranger's retest upload is refused before its body is read: an oversized file gets 404 (not the
    // upload limit's 413, which would mean it was buffered) and no file row or stored file appears.
    const [otherUser] = await t.deps.db.select({ id: users.id }).from(users).where(eq(users.email, other.email));
    const filesBefore = await t.deps.db.select({ id: storedFiles.id }).from(storedFiles).where(eq(storedFiles.ownerId, otherUser!.id));
    const otherToken = await other.agent.token();
    const oversized = Buffer.concat([await simplePdf(['Retest']), Buffer.alloc(PDF_MAX_BYTES + 1024, 32)]);
    const stranger = await other.agent.raw.post(`/claims/${res.body.id}/retest`).set('X-XSRF-TOKEN', otherToken).attach('report', oversized, 'retest.pdf');
    expect(stranger.status).toBe(404);
    const strangerSmall = await other.agent.raw.post(`/claims/${res.body.id}/retest`).set('X-XSRF-TOKEN', otherToken).attach('report', await simplePdf(['Not mine']), 'retest.pdf');
    expect(strangerSmall.status).toBe(404);
    expect(await t.deps.db.select({ id: storedFiles.id }).from(storedFiles).where(eq(storedFiles.ownerId, otherUser!.id))).toEqual(filesBefore);
    expect((await buyer.agent.get(`/claims/${res.body.id}`)).body.retest.reportUrl).toBe(`/api/claims/${res.body.id}/retest`);

    // The order page lists the order's claims for its buyer, its grower and admins, and for nobody else.
    const grower = t.agent();
    await grower.post('/auth/sign-in', { email: g.email, password: g.password });
    for (const agent of [buyer.agent, grower, admin.agent]) {
      const list = await agent.get(`/claims?orderId=${order.id}`);
      expect([list.status, list.body.items.map((c: { id: number; status: string }) => [c.id, c.status])]).toEqual([200, [[res.body.id, 'open']]]);
    }
    expect((await other.agent.get(`/claims?orderId=${order.id}`)).status).toBe(404);
    expect((await buyer.agent.get(`/claims?orderId=${late.id}`)).body.items).toEqual([]);
    expect((await buyer.agent.get('/claims?orderId=abc')).status).toBe(400);
  }, 60_000);

  it('refuses a retest dated before the lot was sampled or after today, naming the dates (400)', async () => {
    // The retest is of the hay sold, so its report cannot predate the listing's own sample (fixture: sampled
    // 2026-06-28, harvest from 2026-06-01) nor be dated after tomorrow (test clock 2026-09-15). Common practice.
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    const order = await deliveredYesterday(g.farm.id);
    const before = await buyer.agent.post('/claims', { orderId: order.id, reason: 'Leafless and stemmy; our lab found far less protein.', retest: { ...RETEST, reportDate: '2026-06-20' } });
    expect(before.status).toBe(400);
    expect(before.body.error.details).toEqual([{ path: 'retest.reportDate', message: expect.stringContaining('2026-06-28') }]);
    const future = await buyer.agent.post('/claims', { orderId: order.id, reason: 'Leafless and stemmy; our lab found far less protein.', retest: { ...RETEST, reportDate: '2027-01-05' } });
    expect(future.status).toBe(400);
    expect(future.body.error.details[0].message).toMatch(/future/);
    const [o] = await t.deps.db.select().from(orders).where(eq(orders.id, order.id));
    expect(o!.status).toBe('delivered');
  });

  it('ends in a partial refund once, e-mails both sides, audits it, and lowers the grower’s payout for the order', async () => {
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    const order = await deliveredYesterday(g.farm.id);
    const claim = (await buyer.agent.post('/claims', { orderId: order.id, reason: 'Leafless and stemmy; our lab found far less protein.', retest: RETEST })).body;
    const before = await platformBalance(t.deps.stripe);
    const decision = { outcome: 'partial', refundCents: 20_000, note: 'The retest is outside tolerance on CP, ADF and NDF; $200 back on the hay.' };
    const [a, b] = await Promise.all([admin.agent.post(`/admin/claims/${claim.id}/resolve`, decision), admin.agent.post(`/admin/claims/${claim.id}/resolve`, decision)]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect(before - (await platformBalance(t.deps.stripe))).toBe(20_000);
    const [o] = await t.deps.db.select().from(orders).where(eq(orders.id, order.id));
    expect(o).toMatchObject({ status: 'completed', refundedCents: 20_000 });
    const refunds = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.action, 'refund.issued'), eq(auditEvents.entityId, String(order.id))));
    expect(refunds).toEqual([expect.objectContaining({ before: { refundedCents: 0 }, after: { refundedCents: 20_000 } })]);

    await t.drainJobs();
    const decided = t.mails.filter((m) => m.subject === `Claim decided: order ${order.id}`).map((m) => m.to).sort();
    expect(decided).toEqual([buyer.email, g.email].sort());

    // All three roles see the outcome.
    const grower = t.agent();
    await grower.post('/auth/sign-in', { email: g.email, password: g.password });
    for (const agent of [buyer.agent, grower, admin.agent]) {
      expect((await agent.get(`/claims/${claim.id}`)).body).toMatchObject({ status: 'upheld', refundCents: 20_000 });
    }

    // The grower's payout for the order: 1,200.00 hay + 100.00 freight − 200.00 refunded.
    const due = (await admin.agent.get('/admin/payouts/due')).body.items.find((i: { farmId: number }) => i.farmId === g.farm.id);
    expect(due.totalCents).toBe(110_000);
    const batch = (await admin.agent.post('/admin/payouts/batches', { requestKey: randomUUID(), farmIds: [g.farm.id] })).body;
    const settled = await admin.agent.post(`/admin/payouts/batches/${batch.id}/settle`);
    expect(settled.body.payouts[0]).toMatchObject({ status: 'sent', amountCents: 110_000 });
  }, 60_000);

  it('closes the claim window at the order’s own acceptance date, even when the claim setting was lengthened after delivery', async () => {
    // Delivered yesterday with a one-day acceptance time (the settings then), now past: the order is due to the
    // grower and may already be paid out, so a claim now would refund money the grower has been paid.
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    const order = await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: 50_000, status: 'delivered', deliveredAt: plusDays(new Date(now()), -1), acceptBy: new Date(now() - 60_000), buyerId });
    const late = await buyer.agent.post('/claims', { orderId: order.id, reason: 'Found mould after the acceptance date.' });
    expect([late.status, late.body.error?.code]).toEqual([409, 'claim_window_closed']);
    const [o] = await t.deps.db.select().from(orders).where(eq(orders.id, order.id));
    expect(o!.status).toBe('delivered');
  }, 60_000);

  it('never both pays an order out and opens a claim on it when a batch and a claim race at the acceptance date', async () => {
    // The buyer's request runs on a clock a second before the acceptance date, the admin's a moment after it
    // (two servers a second apart): each alone would succeed. Real concurrency against PostgreSQL, ten rounds.
    const buyerSide = await startTestApi({}, { stripe: t.stripeFake });
    try {
      buyerSide.clock.set(new Date(now() - 1_500));
      const racer = await signedInUser(buyerSide, 'buyer');
      const racerId = (await racer.agent.get('/auth/me')).body.user.id as number;
      const outcomes: string[] = [];
      for (let round = 0; round < 10; round += 1) {
        const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
        const order = await deliveredOrder(t.deps.db, t.deps.stripe, g.farm.id, { goodsCents: 40_000, status: 'delivered', deliveredAt: plusDays(new Date(now()), -1), acceptBy: new Date(now() - 500), buyerId: racerId });
        const [claim, batch] = await Promise.all([
          racer.agent.post('/claims', { orderId: order.id, reason: 'Wet bales in the middle of the stack.' }),
          admin.agent.post('/admin/payouts/batches', { requestKey: randomUUID(), farmIds: [g.farm.id] }),
        ]);
        const inPayout = (await t.deps.db.select().from(payoutLines).where(eq(payoutLines.orderId, order.id))).length;
        outcomes.push(`${claim.status}/${batch.status}/${inPayout}`);
      }
      // Either the claim won (201; the batch found nothing due: 409, no line) or the payout did (a line; claim 409).
      expect(outcomes.filter((o) => o !== '201/409/0' && o !== '409/201/1')).toEqual([]);
    } finally {
      await buyerSide.close();
    }
  }, 120_000);

  it('rejects a claim without money moving, and a full refund returns everything the buyer paid', async () => {
    const g = await growerWithPayouts(t.deps.db, t.deps.stripe);
    const kept = await deliveredYesterday(g.farm.id);
    const c1 = (await buyer.agent.post('/claims', { orderId: kept.id, reason: 'Smells a bit different from last year.' })).body;
    const before = await platformBalance(t.deps.stripe);
    const rejected = await admin.agent.post(`/admin/claims/${c1.id}/resolve`, { outcome: 'reject', note: 'No retest and the photos show bright, leafy hay.' });
    expect(rejected.body).toMatchObject({ status: 'declined', refundCents: 0 });
    expect(await platformBalance(t.deps.stripe)).toBe(before);

    const bad = await deliveredYesterday(g.farm.id);
    const c2 = (await buyer.agent.post('/claims', { orderId: bad.id, reason: 'Mouldy through the middle of most bales.', retest: RETEST })).body;
    expect((await admin.agent.post(`/admin/claims/${c2.id}/resolve`, { outcome: 'partial', refundCents: 999_999, note: 'Too much on purpose.' })).status).toBe(400);
    const full = await admin.agent.post(`/admin/claims/${c2.id}/resolve`, { outcome: 'full', note: 'Mould confirmed; everything back.' });
    expect(full.body).toMatchObject({ status: 'upheld', refundCents: 133_600, refundableCents: 0 });
    const [o] = await t.deps.db.select().from(orders).where(eq(orders.id, bad.id));
    expect(o!.status).toBe('refunded');
  }, 60_000);

  async function deliveredTenDaysAgo(farmId: number) {
    return deliveredOrder(t.deps.db, t.deps.stripe, farmId, { goodsCents: 50_000, status: 'delivered', deliveredAt: plusDays(new Date(now()), -10), acceptBy: plusDays(new Date(now()), 1), buyerId });
  }
});
