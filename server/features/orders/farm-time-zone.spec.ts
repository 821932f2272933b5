import { eq } from 'drizzle-orm';
import { farms } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { signedInUser } from '../../../tests/support/grower-lot';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';

jest.setTimeout(60_000);

const PROFILE = { name: 'Mesa Edge Hay (invented)', addressLine: '4 Canal Road', zip: '85001', deliveryRadiusMi: 90 };

/**
 * The farm's time zone is recorded (an IANA name, checked) and delivery days and pickup hours are its
 * clock. Offsets from the IANA tz database: Arizona keeps MST (UTC−7) all year; Pacific daylight time is UTC−7.
 */
describe('farm time zone', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('is recorded on the farm profile: its state’s zone by default, another IANA zone on request, nonsense refused', async () => {
    const { agent } = await signedInUser(t, 'grower');
    const created = await agent.put('/farms/mine', PROFILE);
    expect(created.status).toBe(200);
    // 85001 is Phoenix, AZ.
    expect(created.body.farm).toMatchObject({ state: 'AZ', timeZone: 'America/Phoenix' });
    const bad = await agent.put('/farms/mine', { ...PROFILE, timeZone: 'Mountain Time' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('timeZone');
    expect((await agent.put('/farms/mine', { ...PROFILE, timeZone: 'America/Denver' })).body.farm.timeZone).toBe('America/Denver');
    // Saving without a zone keeps the one chosen.
    expect((await agent.put('/farms/mine', PROFILE)).body.farm.timeZone).toBe('America/Denver');
  });

  it('books a 9:00 pickup on the farm’s clock: 9:00 MST in Arizona is 16:00 UTC, shown back with the zone', async () => {
    const grower = await createGrower(t.deps.db, '85001');
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Desert alfalfa' });
    const buyer = await signedInUser(t, 'buyer');
    const res = await buyer.agent.post('/orders', { lotId: lot.id, bales: 40, method: 'pickup', window: { date: '2026-09-17', pickupHour: 9 } });
    expect(res.status).toBe(201);
    const order = (await buyer.agent.get(`/orders/${res.body.id}`)).body;
    expect(order.farm.timeZone).toBe('America/Phoenix');
    expect(order.delivery).toMatchObject({ windowStart: '2026-09-17T16:00:00.000Z', windowEnd: '2026-09-17T17:00:00.000Z' });
  });

  it('puts a late pickup on the farm’s own day in the grower’s calendar (23:00 PDT on the 17th is 06:00 UTC on the 18th)', async () => {
    const grower = await createGrower(t.deps.db, '90001');
    await t.deps.db.update(farms).set({ pickupToHour: 24 }).where(eq(farms.id, grower.farm.id));
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Coastal oat hay' });
    const buyer = await signedInUser(t, 'buyer');
    const placed = await buyer.agent.post('/orders', { lotId: lot.id, bales: 40, method: 'pickup', window: { date: '2026-09-17', pickupHour: 23 } });
    expect(placed.status).toBe(201);
    expect((await buyer.agent.get(`/orders/${placed.body.id}`)).body.delivery.windowStart).toBe('2026-09-18T06:00:00.000Z');

    const farmer = t.agent();
    await farmer.post('/auth/sign-in', { email: grower.email, password: grower.password });
    const week = await farmer.get('/delivery-calendar?from=2026-09-17&days=2');
    expect(week.status).toBe(200);
    expect(week.body.timeZone).toBe('America/Los_Angeles');
    const [thursday, friday] = week.body.days;
    expect(thursday.date).toBe('2026-09-17');
    expect(thursday.orders.map((o: { id: number }) => o.id)).toEqual([placed.body.id]);
    expect(friday.orders).toEqual([]);
  });
});
