import { and, eq, inArray } from 'drizzle-orm';
import { lots, orderEvents, orders } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { signedInUser } from '../../../tests/support/grower-lot';
import { deliveredOrder } from '../../../tests/support/paid-orders';
import { startStripeFake, startTestApi, type StripeFakeServer, type TestApi } from '../../../tests/support/test-api';
import { COMPLETE_UNANSWERED, EXPIRE_HOLDS, registerOrderSweeps, scheduleOrderSweeps, SWEEP_CRON } from './order-sweeps';
import { plusDays } from '@shared/time/days';

jest.setTimeout(90_000);


/**
 * The order sweeps run as pg-boss jobs. Two APIs stand for two server workers: each has its own pool
 * and its own queue, and both run the same sweep at the same moment against one PostgreSQL.
 */
describe('order sweeps (job queue)', () => {
  let stripe: StripeFakeServer;
  let one: TestApi;
  let two: TestApi;
  beforeAll(async () => {
    stripe = await startStripeFake();
    one = await startTestApi({}, { stripe });
    two = await startTestApi({}, { stripe });
    registerOrderSweeps(one.deps);
    registerOrderSweeps(two.deps);
  });
  afterAll(async () => {
    await one.close();
    await two.close();
    await stripe.close();
  });

  /** Both workers run the sweep of `kind` at once (real concurrency: two pools, two pg-boss queues). */
  async function sweepTwiceAtOnce(kind: typeof EXPIRE_HOLDS) {
    await Promise.all([one.deps.jobs.enqueue(kind, {}), two.deps.jobs.enqueue(kind, {})]);
    const outcomes = await Promise.all([one.drainJobs(), two.drainJobs()]);
    expect(outcomes.reduce((n, o) => n + o.failed, 0)).toBe(0);
  }

  it('stores one cron schedule per sweep, however many workers save it', async () => {
    await Promise.all([scheduleOrderSweeps(one.deps), scheduleOrderSweeps(one.deps)]);
    const schedules = await one.deps.jobs.schedules();
    expect(schedules.filter((s) => s.name === EXPIRE_HOLDS.name)).toEqual([{ name: EXPIRE_HOLDS.name, cron: SWEEP_CRON }]);
    expect(schedules.filter((s) => s.name === COMPLETE_UNANSWERED.name)).toEqual([{ name: COMPLETE_UNANSWERED.name, cron: SWEEP_CRON }]);
  });

  it('ends holds that ran out exactly once when two workers sweep at the same time: every bale comes back once', async () => {
    const grower = await createGrower(one.deps.db);
    const lot = await createLot(one.deps.db, grower.farm.id, { title: 'Sweep test lot' });
    const ids: number[] = [];
    for (let i = 0; i < 5; i++) {
      const buyer = await signedInUser(one, 'buyer');
      const res = await buyer.agent.post('/orders', { lotId: lot.id, bales: 40, method: 'pickup' });
      expect(res.status).toBe(201);
      ids.push(res.body.id);
    }
    const balesLeft = async () => (await one.deps.db.select({ n: lots.balesAvailable }).from(lots).where(eq(lots.id, lot.id)))[0]!.n;
    expect(await balesLeft()).toBe(400 - 5 * 40);
    // These holds ran out a minute ago (others' holds in the shared database are left alone: they are not due).
    await one.deps.db.update(orders).set({ reservedUntil: new Date(one.clock.now().getTime() - 60_000) }).where(inArray(orders.id, ids));

    await sweepTwiceAtOnce(EXPIRE_HOLDS);

    expect(await balesLeft()).toBe(400);
    const rows = await one.deps.db.select({ status: orders.status }).from(orders).where(inArray(orders.id, ids));
    expect(rows.map((r) => r.status)).toEqual(Array(5).fill('expired'));
    const ended = await one.deps.db.select().from(orderEvents).where(and(inArray(orderEvents.orderId, ids), eq(orderEvents.event, 'expire')));
    expect(ended).toHaveLength(5);
    // A third run finds nothing more to do.
    await one.deps.jobs.enqueue(EXPIRE_HOLDS, {});
    await one.drainJobs();
    expect(await balesLeft()).toBe(400);
  });

  it('completes unanswered deliveries once and sends one receipt each when two workers sweep at the same time', async () => {
    const grower = await createGrower(one.deps.db);
    const now = one.clock.now().getTime();
    const ids: number[] = [];
    for (let i = 0; i < 3; i++) {
      const order = await deliveredOrder(one.deps.db, one.deps.stripe, grower.farm.id, { goodsCents: 30_000, status: 'delivered', deliveredAt: plusDays(new Date(now), -5), acceptBy: plusDays(new Date(now), -1) });
      ids.push(order.id);
    }
    await sweepTwiceAtOnce(COMPLETE_UNANSWERED);
    // The receipts are jobs in whichever worker's outbox completed the order.
    await Promise.all([one.drainJobs(), two.drainJobs()]);

    const rows = await one.deps.db.select({ status: orders.status }).from(orders).where(inArray(orders.id, ids));
    expect(rows.map((r) => r.status)).toEqual(['completed', 'completed', 'completed']);
    const accepted = await one.deps.db.select().from(orderEvents).where(and(inArray(orderEvents.orderId, ids), eq(orderEvents.event, 'accept')));
    expect(accepted).toHaveLength(3);
    const receipts = [...one.mails, ...two.mails].filter((m) => ids.some((id) => m.subject === `Receipt for order ${id}`));
    expect(receipts).toHaveLength(3);
  });
});
