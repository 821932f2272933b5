import { randomUUID } from 'node:crypto';
import { eq, inArray } from 'drizzle-orm';
import { farms, labAnalyses, lots } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { KG_PER_SHORT_TON } from '@shared/units/mass';

describe('planner API', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  describe('POST /planner/requirements', () => {
    const ask = (body: object) => t.agent().post('/planner/requirements', body);

    it('500 kg at maintenance: DE 16.65 Mcal, CP 630 g, DMI 10 kg DM (NRC 2007 average maintenance 0.0333·BW and 1.26 g CP/kg BW, verified via Merck Vet Manual and hoofrehab.com NRC summary; 2 % BW intake from memory)', async () => {
      const res = await ask({ bodyWeightKg: 500, class: 'maintenance' });
      expect(res.status).toBe(200);
      expect(res.body.deMcalPerDay).toBeCloseTo(16.65, 6);
      expect(res.body.crudeProteinGPerDay).toBeCloseTo(630, 6);
      expect(res.body.dmiKgPerDay).toBeCloseTo(10, 6);
      expect(res.body.source).toMatch(/NRC \(2007\)/);
    });

    it('500 kg in light work: DE 20.0 Mcal (maintenance ×1.2, Merck Vet Manual citing NRC 2007) and CP 699 g (NRC 2007 via hoofrehab.com summary)', async () => {
      const res = await ask({ bodyWeightKg: 500, class: 'light-work' });
      expect(res.body.deMcalPerDay).toBeCloseTo(19.98, 6);
      expect(res.body.crudeProteinGPerDay).toBeCloseTo(699, 6);
    });

    it('500 kg in moderate / heavy / very heavy work: DE 23.3 / 26.6 / 34.5 Mcal (multipliers verified via Merck), CP 768 / 862 / 1,004 g (NRC 2007 Table 16-3, from memory)', async () => {
      const rows = await Promise.all(['moderate-work', 'heavy-work', 'very-heavy-work'].map((c) => ask({ bodyWeightKg: 500, class: c })));
      expect(rows.map((r) => Math.round(r.body.deMcalPerDay * 10) / 10)).toEqual([23.3, 26.6, 34.5]);
      expect(rows.map((r) => Math.round(r.body.crudeProteinGPerDay))).toEqual([768, 862, 1004]);
    });

    it('500 kg at minimum maintenance: DE 15.2 Mcal a day (NRC 2007 via hoofrehab.com quick glance, 15.2–18.2 Mcal)', async () => {
      const res = await ask({ bodyWeightKg: 500, class: 'minimum-maintenance' });
      expect(res.status).toBe(200);
      expect(Math.round(res.body.deMcalPerDay * 10) / 10).toBe(15.2);
    });

    it('500 kg mare at gestation month 6 and lactation month 3: 17.4 Mcal / 704 g (Thunes; NRC 2007 rows quoted) and 30.6 Mcal (memory)', async () => {
      const gestation = await ask({ bodyWeightKg: 500, class: 'gestation', month: 6 });
      const lactation = await ask({ bodyWeightKg: 500, class: 'lactation', month: 3 });
      expect(gestation.status).toBe(200);
      expect(Math.round(gestation.body.deMcalPerDay * 10) / 10).toBe(17.4);
      expect(Math.round(gestation.body.crudeProteinGPerDay)).toBe(704);
      expect(Math.round(lactation.body.deMcalPerDay * 10) / 10).toBe(30.6);
      expect(lactation.body.source).toMatch(/lactation month 3/);
      const missing = await ask({ bodyWeightKg: 500, class: 'gestation' });
      expect(missing.status).toBe(400);
    });

    it('500 kg mare: gestation month 11 DE 21.4 Mcal (Thunes, from NRC 2007), CP 893 g; lactation month 1 DE 31.7 Mcal (memory), CP 1,535 g (NRC 2007 rows quoted)', async () => {
      const gestation = await ask({ bodyWeightKg: 500, class: 'late-gestation' });
      const lactation = await ask({ bodyWeightKg: 500, class: 'lactation' });
      expect(gestation.body.deMcalPerDay).toBeCloseTo(21.4, 6);
      expect(gestation.body.crudeProteinGPerDay).toBeCloseTo(893, 6);
      expect(lactation.body.deMcalPerDay).toBeCloseTo(31.7, 6);
      expect(lactation.body.crudeProteinGPerDay).toBeCloseTo(1535, 6);
    });

    it('answers 400 naming the field for a weight outside the NRC range, an unknown class or a missing weight', async () => {
      const light = await ask({ bodyWeightKg: 100, class: 'maintenance' });
      expect(light.status).toBe(400);
      expect(light.body.error.details.map((d: { path: string }) => d.path)).toContain('bodyWeightKg');
      const unknown = await ask({ bodyWeightKg: 500, class: 'racing' });
      expect(unknown.status).toBe(400);
      expect(unknown.body.error.details.map((d: { path: string }) => d.path)).toContain('class');
      const missing = await ask({ class: 'maintenance' });
      expect(missing.body.error.details.map((d: { path: string }) => d.path)).toContain('bodyWeightKg');
      const growing = await ask({ bodyWeightKg: 250, class: 'growing' });
      expect(growing.body.error.details.map((d: { path: string }) => d.path)).toContain('ageMonths');
    });
  });

  describe('POST /planner/herd-needs', () => {
    it('4 × 1,100 lb idle horses for a year, round-bale feeder, 88 % DM hay: 39.9 kg DM/day, 20.3 t as-fed to buy (2 % BW of DM; 10 % waste per Martinson et al. 2012)', async () => {
      const res = await t.agent().post('/planner/herd-needs', {
        groups: [{ count: 4, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance' }],
        days: 365,
        feedingMethod: 'round-bale-feeder',
        hayShareOfDiet: 1,
        lot: { dryMatterPct: 88, crudeProteinPctDm: 10, deMcalPerKgDm: 2.0, baleWeightLb: 1000 },
      });
      expect(res.status).toBe(200);
      // 4 × 499.0 kg × 2 % = 39.9 kg DM/day; ÷ 0.88 = 45.4 kg as-fed = 100.0 lb/day; × 365 ÷ 2,000 lb a ton = 18.25 t; ÷ 0.9 = 20.3 t.
      expect(res.body.totals.dmiKgPerDay).toBeCloseTo(39.92, 1);
      expect(res.body.lot.purchaseTons).toBeCloseTo(20.28, 1);
      expect(res.body.lot.bales).toBe(41);
      expect(res.body.lot.coversEnergy).toBe(true);
    });

    it('answers 400 with the path of the bad group field', async () => {
      const res = await t.agent().post('/planner/herd-needs', {
        groups: [{ count: 0, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance' }],
        days: 30,
        feedingMethod: 'stall-feeder',
        hayShareOfDiet: 1,
      });
      expect(res.status).toBe(400);
      expect(res.body.error.details.map((d: { path: string }) => d.path)).toContain('groups.0.count');
    });
  });

  describe('POST /planner/purchase-plan', () => {
    // A place of its own (Jackson, WY) so other tests' lots are never candidates.
    const zip = '83001';
    const tag = `P${randomUUID().slice(0, 6)}`;
    let grass: number;
    let alfalfa: number;

    beforeAll(async () => {
      const { db } = t.deps;
      // Earlier runs against the same database left lots here: take them off sale.
      await db.update(lots).set({ status: 'withdrawn' }).where(inArray(lots.farmId, db.select({ id: farms.id }).from(farms).where(eq(farms.zip, zip))));
      const here = await createGrower(db, zip);
      const far = await createGrower(db, '82001'); // Cheyenne, WY: far outside the 25-mile search
      grass = (await createLot(db, here.farm.id, { title: `${tag} grass`, priceDollarsPerTon: 150 })).id;
      alfalfa = (await createLot(db, here.farm.id, { title: `${tag} alfalfa`, priceDollarsPerTon: 300 })).id;
      const unquoted = (await createLot(db, here.farm.id, { title: `${tag} no freight rate`, priceDollarsPerTon: 50 })).id;
      const farAway = (await createLot(db, far.farm.id, { title: `${tag} far`, priceDollarsPerTon: 50 })).id;
      await createLot(db, here.farm.id, { title: `${tag} in review`, priceDollarsPerTon: 50, status: 'in_review' });
      // Round figures so the plan can be solved by hand: 90 % DM; grass 6 % CP, 2.0 Mcal/kg DM; alfalfa 20 % CP, 2.4 Mcal/kg DM.
      for (const [id, cp, de] of [[grass, 6, 2.0], [alfalfa, 20, 2.4], [unquoted, 20, 2.4], [farAway, 20, 2.4]] as const) {
        await db.update(labAnalyses).set({ dryMatterPct: 90, crudeProteinPct: cp, deMcalPerKgDm: de }).where(eq(labAnalyses.lotId, id));
      }
      for (const id of [grass, alfalfa, farAway]) {
        await db.update(lots).set({ freightCentsPerLoadedMile: 300, minOrderTons: 0 }).where(eq(lots.id, id));
      }
    });

    const herd = {
      groups: [{ count: 1, bodyWeight: 500, weightUnit: 'kg', class: 'maintenance' }],
      days: 100,
      feedingMethod: 'stall-feeder', // 1.3 % waste (Martinson, UMN webcast 2011)
      hayShareOfDiet: 1,
    };

    it('mixes cheap low-protein grass with alfalfa where energy and protein both just bind (hand-solved)', async () => {
      const res = await t.agent().post('/planner/purchase-plan', { herd, zip, maxDistanceMi: 25 });
      expect(res.status).toBe(200);
      const body = res.body;
      // Only the two quoted, listed lots within reach are candidates.
      expect(body.candidates.map((c: { lotId: number }) => c.lotId).sort()).toEqual([grass, alfalfa].sort());
      expect(body.origin).toMatchObject({ zip, state: 'WY' });

      // Needs over 100 days (NRC 2007 maintenance): DE 16.65 × 100 = 1,665 Mcal; CP 630 g × 100 = 63 kg; intake ≤ 2.5 % BW = 1,250 kg DM.
      // In kg of DM eaten, x from grass and y from alfalfa:
      //   energy  2.0x + 2.4y ≥ 1665      protein 0.06x + 0.20y ≥ 63      cost 150x + 300y (per kg DM, ÷ k)
      // Grass alone needs x = 1,050 (cost 157,500/k); alfalfa alone y = 693.75 (208,125/k); where both bind,
      // x = 832.5 − 1.2y and 0.128y = 13.05 → y = 101.95, x = 710.16 (137,110/k): the cheapest vertex.
      // Tons bought = kg DM ÷ k, with k = 907.2 kg × 90 % DM × (1 − 1.3 % waste).
      const k = KG_PER_SHORT_TON * 0.9 * 0.987;
      // The buyer buys whole 60 lb bales: bales = ⌈tons × 2,000 / 60⌉, weighing bales × 60 / 2,000 t (domain brief §11).
      const LB_PER_SHORT_TON = 2000; // NIST Handbook 44, Appendix C
      const bales = (kgDm: number) => Math.ceil(((kgDm / k) * LB_PER_SHORT_TON) / 60);
      const line = (id: number) => body.lines.find((l: { lotId: number }) => l.lotId === id);
      expect(body.plan.feasible).toBe(true);
      expect(line(grass).bales).toBe(bales(710.156));
      expect(line(alfalfa).bales).toBe(bales(101.953));
      expect(line(grass).tons).toBeCloseTo((bales(710.156) * 60) / LB_PER_SHORT_TON, 9);
      // Same ZIP: no freight miles, so the cost is the hay alone: the bales' weight × $150/t.
      expect(line(grass).freightCents).toBe(0);
      expect(line(grass).hayCents).toBe(Math.round(((bales(710.156) * 60) / LB_PER_SHORT_TON) * 15000));
      expect(body.plan.totalCostCents).toBe(body.lines.reduce((s: number, l: { costCents: number }) => s + l.costCents, 0));
      expect(body.plan.explanation.join(' ')).toMatch(/mixed in for protein/);
      // Lots are named by their titles, not by number.
      expect(body.plan.explanation.join(' ')).toContain(`“${tag} grass”`);
      expect(body.plan.explanation.join(' ')).not.toContain(`lot #${grass}`);
      // The forage floor: 500 kg × 1.5 % × 100 d = 750 kg DM (NRC 2007); the hand-solved mix eats 812 kg DM, above it.
      expect(body.plan.supplied.dryMatterKg).toBeGreaterThanOrEqual(750);
      expect(body.plan.explanation.join(' ')).toMatch(/The single-lot planner feeds the same herd 10\.0 kg a day/);
      expect(body.herd.totals.period.deMcal).toBeCloseTo(1665, 6);
    });

    it('offers no plan when the herd needs denser energy than any lot can give within intake (very heavy work, NRC 2007)', async () => {
      const res = await t.agent().post('/planner/purchase-plan', {
        herd: { ...herd, groups: [{ count: 1, bodyWeight: 500, weightUnit: 'kg', class: 'very-heavy-work' }] },
        zip,
        maxDistanceMi: 25,
      });
      // DE 0.0363 × 500 × 1.9 = 34.49 Mcal a day within 12.5 kg DM (2.5 % BW) needs 2.76 Mcal/kg DM eaten;
      // the richest lot has 2.4 × 0.987 (waste), so no mix of these hays can do it.
      expect(res.status).toBe(200);
      expect(res.body.plan.feasible).toBe(false);
      expect(res.body.plan.explanation.join(' ')).toMatch(/can eat at most/);
    });

    it('answers 400 with paths for a bad ZIP or herd', async () => {
      const res = await t.agent().post('/planner/purchase-plan', { herd: { ...herd, days: 0 }, zip: '12' });
      expect(res.status).toBe(400);
      expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(['herd.days', 'zip']));
      const unknown = await t.agent().post('/planner/purchase-plan', { herd, zip: '00000' });
      expect(unknown.body.error.code).toBe('unknown_zip');
    });
  });
  describe('POST /planner/purchase-plan, priced as the hay list prices it', () => {
    // A place of its own (Helena, MT) with one lot of 1,300 lb round bales at $145/t.
    const zip = '59601';
    let rounds: number;

    beforeAll(async () => {
      const { db } = t.deps;
      await db.update(lots).set({ status: 'withdrawn' }).where(inArray(lots.farmId, db.select({ id: farms.id }).from(farms).where(eq(farms.zip, zip))));
      const here = await createGrower(db, zip);
      rounds = (await createLot(db, here.farm.id, { title: `P${randomUUID().slice(0, 6)} rounds`, priceDollarsPerTon: 145 })).id;
      await db.update(lots).set({ avgBaleWeightLb: 1300, baleCount: 40, balesAvailable: 40, freightCentsPerLoadedMile: 300, minOrderTons: 0 }).where(eq(lots.id, rounds));
      await db.update(labAnalyses).set({ dryMatterPct: 88, crudeProteinPct: 20, deMcalPerKgDm: 2.0 }).where(eq(labAnalyses.lotId, rounds));
    });

    it('states the hay cost of the whole bales it tells the buyer to buy, the same as the order quote for those bales', async () => {
      const herd = { groups: [{ count: 1, bodyWeight: 500, weightUnit: 'kg', class: 'maintenance' }], days: 100, feedingMethod: 'stall-feeder', hayShareOfDiet: 1 };
      const res = await t.agent().post('/planner/purchase-plan', { herd, zip, maxDistanceMi: 25 });
      expect(res.status).toBe(200);
      // By hand: 1,665 Mcal (NRC 2007 maintenance, 16.65 Mcal × 100 d) ÷ 2.0 Mcal/kg = 832.5 kg DM eaten
      // ÷ (907.2 kg × 88 % DM × (1 − 1.3 % waste, Martinson 2011)) = 1.057 t = 1.63 bales of 1,300 lb → 2 bales
      // = 2 × 1,300 / 2,000 = 1.30 t × $145/t = $188.50 (domain brief §11). The herd's 1.057 t alone would be $153.27.
      expect(res.body.lines).toHaveLength(1);
      const [line] = res.body.lines;
      expect(line).toMatchObject({ lotId: rounds, bales: 2, tons: 1.3, hayCents: 18850, freightCents: 0, costCents: 18850 });
      expect(res.body.plan.totalCostCents).toBe(18850);

      // The hay list and checkout quote the same bales through GET /orders/quote: the goods must agree to the cent.
      let quoted = 0;
      for (const l of res.body.lines as { lotId: number; bales: number }[]) {
        const quote = await t.agent().get(`/orders/quote?lotId=${l.lotId}&bales=${l.bales}&method=pickup`);
        expect(quote.status).toBe(200);
        quoted += quote.body.goodsCents;
      }
      expect(res.body.lines.reduce((s: number, l: { hayCents: number }) => s + l.hayCents, 0)).toBe(quoted);
    });
  });

});
