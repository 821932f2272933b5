import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { labAnalyses, lots } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { KG_PER_SHORT_TON } from '@shared/units/mass';

describe('GET /lots/compare', () => {
  let t: TestApi;
  const tag = `C${randomUUID().slice(0, 6)}`;
  let near: number;
  let far: number;
  let hidden: number;

  beforeAll(async () => {
    t = await startTestApi();
    const { db } = t.deps;
    const home = await createGrower(db, '66502');
    const away = await createGrower(db, '68901');
    near = (await createLot(db, home.farm.id, { title: `${tag} near`, priceDollarsPerTon: 300, analysis: { dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40 } })).id;
    far = (await createLot(db, away.farm.id, { title: `${tag} far`, priceDollarsPerTon: 200, analysis: { dryMatterPct: 90, crudeProteinPct: 10, adfPct: 35, ndfPct: 60 } })).id;
    hidden = (await createLot(db, home.farm.id, { title: `${tag} hidden`, status: 'in_review' })).id;
    await db.update(lots).set({ freightCentsPerLoadedMile: 350 }).where(eq(lots.id, far));
    await db.update(labAnalyses).set({ deMcalPerKgDm: 2.0 }).where(eq(labAnalyses.lotId, far));
  });
  afterAll(() => t.close());

  it('returns the lots in the order asked, with nutrients on a DM basis, and lists ids not on sale', async () => {
    const res = await t.agent().get(`/lots/compare?ids=${far},${near},${hidden}`);
    expect(res.status).toBe(200);
    expect(res.body.items.map((i: { id: number }) => i.id)).toEqual([far, near]);
    expect(res.body.missingIds).toEqual([hidden]);
    expect(res.body.items[1].nutrients).toMatchObject({ dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40 });
    expect(res.body.items[1].nutrients.rfv).toBeGreaterThan(100);
    expect(res.body.items[1].nutrients.deMcalPerKgDm).toBeGreaterThan(1.5);
  });

  it('without a ZIP prices at the farm: $200/t at 90 % DM and 10 % CP is $222.22/t DM and $1.11 per lb CP (domain brief §11 arithmetic)', async () => {
    const res = await t.agent().get(`/lots/compare?ids=${far}`);
    const p = res.body.items[0].pricing;
    expect(p.basis).toBe('at-farm');
    expect(p.note).toMatch(/ZIP/);
    // Fixture stock is 400 bales × 60 lb = 12 t, less than a 24 t load, so the whole stock is priced.
    expect(p.tons).toBe(12);
    expect(p.freightCents).toBe(0);
    expect(p.perDmTonCents).toBeCloseTo(20000 / 0.9, 6);
    // A ton of 2,000 lb × 0.90 × 0.10 = 180 lb of protein per ton.
    expect(p.perLbCrudeProteinCents).toBeCloseTo(20000 / 180, 6);
    // 907.2 kg × 0.90 × 2.0 Mcal = 1,633 Mcal per ton.
    expect(p.perMcalDeCents).toBeCloseTo(20000 / (KG_PER_SHORT_TON * 0.9 * 2.0), 6);
  });

  it('with a ZIP adds freight at the grower rate per loaded mile, per whole load, into every per-unit cost', async () => {
    const res = await t.agent().get(`/lots/compare?ids=${far},${near}&zip=66502&tons=12`);
    const [farLot, nearLot] = res.body.items;
    expect(res.body.origin).toMatchObject({ zip: '66502', state: 'KS' });
    expect(farLot.distanceMi).toBeGreaterThan(120);
    const p = farLot.pricing;
    expect(p.basis).toBe('delivered');
    expect(p.loads).toBe(1);
    expect(p.freightCents).toBe(Math.round(350 * farLot.distanceMi));
    expect(p.totalCents).toBe(12 * 20000 + p.freightCents);
    expect(p.perTonCents).toBeCloseTo(p.totalCents / 12, 6);
    expect(p.perLbCrudeProteinCents).toBeCloseTo(p.perTonCents / 180, 6);
    // The near lot has no freight rate: priced at the farm, and it says so.
    expect(nearLot.pricing.basis).toBe('at-farm');
    expect(nearLot.pricing.note).toMatch(/freight rate/);
  });

  it('rejects more than four ids, junk ids and bad ZIPs with 400', async () => {
    expect((await t.agent().get('/lots/compare?ids=1,2,3,4,5')).status).toBe(400);
    const junk = await t.agent().get('/lots/compare?ids=abc');
    expect(junk.status).toBe(400);
    expect(junk.body.error.details[0].path).toMatch(/^ids/);
    expect((await t.agent().get('/lots/compare')).status).toBe(400);
    expect((await t.agent().get(`/lots/compare?ids=${far}&zip=123`)).status).toBe(400);
  });
});
