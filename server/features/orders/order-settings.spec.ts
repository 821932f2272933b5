import { eq } from 'drizzle-orm';
import { DEFAULT_SETTINGS } from '@shared/contracts/platform-settings';
import { TEST_CARD_OK } from '../../../docker-local-fakes/stripe/stripe-fake';
import { orders } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { signedInUser } from '../../../tests/support/grower-lot';
import { holdSettings } from '../../../tests/support/settings-lock';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { SettingsService } from '../settings/settings.service';
import { plusDays } from '@shared/time/days';

jest.setTimeout(60_000);

/**
 * The fee and the acceptance window come from the admin's platform settings, read when they apply;
 * an order keeps the fee rate it was sold at. Real PostgreSQL and the Stripe fake.
 */
describe('orders follow the platform settings', () => {
  let t: TestApi;
  let release: () => Promise<void>;
  let settings: SettingsService;
  let adminId: number;
  beforeAll(async () => {
    release = await holdSettings('change');
    t = await startTestApi();
    settings = new SettingsService(t.deps.db, t.clock);
    adminId = (await createGrower(t.deps.db)).user.id;
  });
  afterAll(async () => {
    await settings.update(adminId, DEFAULT_SETTINGS).catch(() => undefined);
    await t.close();
    await release();
  });

  const pay = (url: string) => fetch(url, { method: 'POST', redirect: 'manual', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: `card=${TEST_CARD_OK}` });

  it('prices with the fee in force, keeps it on the order when the setting changes, and refunds at the rate sold', async () => {
    await settings.update(adminId, { ...DEFAULT_SETTINGS, platformFeeBps: 500, acceptanceDays: 5 });
    const grower = await createGrower(t.deps.db);
    // 60 lb bales at $300/t: 100 bales = 3 t = $900 of hay.
    const lot = await createLot(t.deps.db, grower.farm.id, { title: 'Fee test alfalfa' });
    const buyer = await signedInUser(t, 'buyer');

    const quote = await buyer.agent.get(`/orders/quote?lotId=${lot.id}&bales=100&method=pickup`);
    expect(quote.body).toMatchObject({ goodsCents: 90_000, platformFeeBps: 500, platformFeeCents: 4_500, totalCents: 94_500 }); // 5 % of $900 = $45

    const first = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup', window: { date: '2026-09-17', pickupHour: 9 } });
    expect(first.status).toBe(201);
    expect(first.body.totalCents).toBe(94_500);

    // The admin lowers the fee to 2 %: the placed order keeps 5 %, a new one pays 2 % ($18 on $900).
    await settings.update(adminId, { ...DEFAULT_SETTINGS, platformFeeBps: 200, acceptanceDays: 5 });
    const kept = await buyer.agent.get(`/orders/${first.body.id}`);
    expect(kept.body).toMatchObject({ platformFeeBps: 500, platformFeeCents: 4_500, totalCents: 94_500 });
    const second = await buyer.agent.post('/orders', { lotId: lot.id, bales: 100, method: 'pickup' });
    expect(second.body.totalCents).toBe(90_000 + 1_800);
    const [row] = await t.deps.db.select().from(orders).where(eq(orders.id, second.body.id));
    expect(row!.platformFeeBps).toBe(200);

    // Paid, handed over at 2.5 t of the 3 t paid for: half a ton is $150 of hay and, at the 5 % it was sold at, $7.50 of fee.
    await pay(first.body.paymentUrl);
    expect((await buyer.agent.get(`/orders/${first.body.id}`)).body.status).toBe('paid');
    const farmer = t.agent();
    await farmer.post('/auth/sign-in', { email: grower.email, password: grower.password });
    expect((await farmer.post(`/orders/${first.body.id}/confirm-date`, {})).status).toBe(200);
    const handed = await farmer.post(`/orders/${first.body.id}/hand-over`, { weighedTons: 2.5 });
    expect(handed.status).toBe(200);
    expect(handed.body.refundedCents).toBe(15_000 + 750);
    // The acceptance window in force at hand-over: 5 days (TEST_NOW + 5 × 24 h).
    expect(handed.body.acceptBy).toBe(plusDays(t.clock.now(), 5).toISOString());
  });
});
