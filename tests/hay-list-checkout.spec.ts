import { eq, inArray } from 'drizzle-orm';
import { lots, orderLines, orders } from '../server/db/schema';
import { createGrower, createLot } from './support/fixtures';
import { signedInUser } from './support/grower-lot';
import { startCheckoutApi } from './support/checkout-api';
import type { TestApi } from './support/test-api';

jest.setTimeout(90_000);

/**
 * Checking out a hay list of several lots against PostgreSQL and the Stripe fake: one order per grower,
 * each with its own hold and payment page and a line per lot; every hold at once or none.
 */
describe('checking out a hay list', () => {
  let t: TestApi;
  let close: () => Promise<void>;
  beforeAll(async () => {
    ({ t, close } = await startCheckoutApi());
  });
  afterAll(() => close());

  /** A listed lot of 60 lb bales at $300/t with `bales` left. */
  async function lotOf(farmId: number, title: string, bales: number) {
    const lot = await createLot(t.deps.db, farmId, { title });
    await t.deps.db.update(lots).set({ baleCount: 400, balesAvailable: bales, status: bales === 0 ? 'sold_out' : 'listed' }).where(eq(lots.id, lot.id));
    return lot;
  }
  const balesLeft = async (ids: number[]) => {
    const rows = await t.deps.db.select({ id: lots.id, n: lots.balesAvailable }).from(lots).where(inArray(lots.id, ids));
    return ids.map((id) => rows.find((r) => r.id === id)!.n);
  };

  it('places one order per grower, each with its own hold, payment page and total; the lines keep each lot', async () => {
    const north = await createGrower(t.deps.db);
    const south = await createGrower(t.deps.db);
    const a = await lotOf(north.farm.id, 'North timothy', 400);
    const c = await lotOf(south.farm.id, 'South orchardgrass', 400);
    const b = await lotOf(north.farm.id, 'North alfalfa', 400);
    const buyer = await signedInUser(t, 'buyer');

    const res = await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: a.id, bales: 100 }, { lotId: c.id, bales: 200 }, { lotId: b.id, bales: 50 }] });
    expect(res.status).toBe(201);
    const placed = res.body.orders as { id: number; totalCents: number; paymentUrl: string; farmName: string; lines: { lotId: number; bales: number }[] }[];
    // Two growers, two orders (growers in the order they first appear on the list), two payment pages.
    expect(placed.map((o) => o.farmName)).toEqual([north.farm.name, south.farm.name]);
    expect(placed.map((o) => o.lines.map((l) => [l.lotId, l.bales]))).toEqual([[[a.id, 100], [b.id, 50]], [[c.id, 200]]]);
    // 60 lb bales at $300/t plus the 3 % fee on each order's hay: north 3 t + 1.5 t = $1,350 + $40.50; south 6 t = $1,800 + $54.
    expect(placed.map((o) => o.totalCents)).toEqual([139_050, 185_400]);
    expect(new Set(placed.map((o) => o.paymentUrl)).size).toBe(2);
    expect(await balesLeft([a.id, b.id, c.id])).toEqual([300, 350, 200]);
    const rows = await t.deps.db.select().from(orders).where(inArray(orders.id, placed.map((o) => o.id)));
    expect(rows.every((r) => r.status === 'awaiting_payment' && r.reservedUntil !== null && r.checkoutSessionId !== null)).toBe(true);
    expect(new Set(rows.map((r) => r.checkoutSessionId)).size).toBe(2);
    // The order page shows both lots of the north order.
    const north1 = await buyer.agent.get(`/orders/${placed[0]!.id}`);
    expect(north1.body.lines.map((l: { lot: { title: string }; bales: number; goodsCents: number }) => [l.lot.title, l.bales, l.goodsCents])).toEqual([['North timothy', 100, 90_000], ['North alfalfa', 50, 45_000]]);
    expect(north1.body).toMatchObject({ bales: 150, goodsCents: 135_000, platformFeeCents: 4_050 });
  });

  it('answers 409 naming the lot that ran short and holds nothing else', async () => {
    const grower = await createGrower(t.deps.db);
    const full = await lotOf(grower.farm.id, 'Plenty of brome', 400);
    const short = await lotOf(grower.farm.id, 'Last of the teff', 30);
    const gone = await lotOf(grower.farm.id, 'Sold-out bermuda', 0);
    const buyer = await signedInUser(t, 'buyer');

    const tooMany = await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: full.id, bales: 100 }, { lotId: short.id, bales: 40 }] });
    expect(tooMany.status).toBe(409);
    expect(tooMany.body.error.message).toMatch(/Last of the teff/);
    expect(tooMany.body.error.message).toMatch(/30/);
    expect(tooMany.body.error.details).toEqual([expect.objectContaining({ path: 'lines.1.bales', lotId: short.id })]);

    const soldOut = await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: full.id, bales: 100 }, { lotId: gone.id, bales: 10 }] });
    expect(soldOut.status).toBe(409);
    expect(soldOut.body.error.message).toMatch(/Sold-out bermuda/);

    expect(await balesLeft([full.id, short.id, gone.id])).toEqual([400, 30, 0]);
    expect(await t.deps.db.select().from(orderLines).where(inArray(orderLines.lotId, [full.id, short.id, gone.id]))).toHaveLength(0);
  });

  it('holds every lot or none when two lists race for the last bales of one lot', async () => {
    const grower = await createGrower(t.deps.db);
    const shared = await lotOf(grower.farm.id, 'Contested prairie hay', 100);
    const mine = await lotOf(grower.farm.id, 'Only on list one', 400);
    const yours = await lotOf(grower.farm.id, 'Only on list two', 400);
    const [one, two] = [await signedInUser(t, 'buyer'), await signedInUser(t, 'buyer')];
    // The lists name the lots in opposite orders: holds are taken in lot order, so neither waits on the other forever.
    const results = await Promise.all([
      one.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: mine.id, bales: 50 }, { lotId: shared.id, bales: 100 }] }),
      two.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: shared.id, bales: 100 }, { lotId: yours.id, bales: 50 }] }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    const loser = results.find((r) => r.status === 409)!;
    expect(loser.body.error.message).toMatch(/Contested prairie hay/);
    const [sharedLeft, mineLeft, yoursLeft] = await balesLeft([shared.id, mine.id, yours.id]);
    expect(sharedLeft).toBe(0);
    // The winner's other lot is held, the loser's is untouched.
    expect(mineLeft + yoursLeft).toBe(350 + 400);
  });

  it('refuses a bad list with a clear 400', async () => {
    const grower = await createGrower(t.deps.db);
    const lot = await lotOf(grower.farm.id, 'Any lot', 400);
    await t.deps.db.update(lots).set({ minOrderTons: 1 }).where(eq(lots.id, lot.id));
    const buyer = await signedInUser(t, 'buyer');
    const twice = await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: lot.id, bales: 40 }, { lotId: lot.id, bales: 40 }] });
    expect(twice.status).toBe(400);
    expect(JSON.stringify(twice.body)).toMatch(/Each lot once/);
    expect((await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [] })).status).toBe(400);
    const noZip = await buyer.agent.post('/orders/from-list', { method: 'delivery', lines: [{ lotId: lot.id, bales: 40 }] });
    expect(noZip.status).toBe(400);
    // Below the lot's 1 t minimum (34 bales of 60 lb, domain brief §11) names the lot too.
    const small = await buyer.agent.post('/orders/from-list', { method: 'pickup', lines: [{ lotId: lot.id, bales: 5 }] });
    expect(small.status).toBe(400);
    expect(small.body.error.message).toMatch(/Any lot/);
    expect(await balesLeft([lot.id])).toEqual([400]);
  });
});
