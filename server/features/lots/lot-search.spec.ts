import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import { LotSearchSchema, SEARCH_TOTAL_CAP, type LotSearch } from '@shared/contracts/lots';
import { haversineMiles } from '@shared/pricing/distance';
import { createDb, type Db } from '../../db/client';
import { farms, labAnalyses, lots, samplingRecords } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { locateZip } from '../geo/geo';
import { LotsService } from './lots.service';
import { lbToShortTons } from '@shared/units';

/**
 * The catalogue searches its trigger-kept search rows; these tests hold it to a plain reference: every lot
 * read through the tables it comes from, filtered and ordered in TypeScript as the catalogue promises
 * (listed, in stock, current analysis; sort key then the higher lot id first).
 */
describe('catalogue search against a plain reference', () => {
  let db: Db;
  let service: LotsService;
  const tag = `S${randomUUID().slice(0, 8)}`;
  const ZIPS = ['66502', '68901', '67202', '73301'];

  beforeAll(async () => {
    db = createDb(process.env['TEST_DATABASE_URL']!, 3);
    service = new LotsService(db);
    const random = mulberry32(20261202);
    const growers = [];
    for (const zip of ZIPS) growers.push(await createGrower(db, zip));
    for (let i = 0; i < 48; i++) {
      const farm = growers[i % growers.length]!.farm;
      const status = i % 11 === 5 ? 'in_review' : i % 13 === 7 ? 'draft' : 'listed';
      const adf = 25 + random() * 12;
      const lot = await createLot(db, farm.id, {
        title: `${tag} lot ${i}`,
        status,
        // Prices repeat every 6 lots, so price ordering must fall back to the lot id.
        priceDollarsPerTon: 150 + (i % 6) * 25,
        analysis: {
          dryMatterPct: 85 + random() * 7,
          crudeProteinPct: 8 + random() * 14,
          adfPct: adf,
          ndfPct: adf + 10 + random() * 20,
          ...(i % 4 === 0 ? { wscPct: 5 + random() * 10, starchPct: 1 + random() * 3 } : {}),
        },
      });
      const changes: Partial<typeof lots.$inferInsert> = {
        forageType: (['alfalfa', 'timothy', 'orchardgrass'] as const)[i % 3],
        baleType: (['small_square_2_string', 'round_4x5'] as const)[i % 2],
        cutting: 1 + (i % 3),
        harvestStartedOn: i % 5 === 0 ? '2025-06-01' : '2026-06-01',
        balesAvailable: i % 9 === 4 ? 0 : 50 + i * 7,
        avgBaleWeightLb: 60 + (i % 4) * 300,
        // Some lots share a publication time, so "newest" must fall back to the lot id too.
        ...(status === 'listed' ? { publishedAt: new Date(Date.UTC(2026, 10, 1, 0, Math.floor(i / 2))) } : {}),
      };
      await db.update(lots).set(changes).where(eq(lots.id, lot.id));
      if (i % 7 === 3) await db.delete(samplingRecords).where(eq(samplingRecords.lotId, lot.id));
      if (i % 8 === 2) await db.update(samplingRecords).set({ compliant: false }).where(eq(samplingRecords.lotId, lot.id));
      if (i % 6 === 1) await db.update(labAnalyses).set({ verification: 'pending' }).where(eq(labAnalyses.lotId, lot.id));
    }
  }, 60_000);
  afterAll(() => db.$client.end());

  const QUERIES: Record<string, string>[] = [
    {},
    { sort: 'price' },
    { sort: 'price', pageSize: '5', page: '2' },
    { sort: 'price_dm' },
    { sort: 'rfv', rfvMin: '110', rfvMax: '190' },
    { sort: 'protein', cpMin: '12', cpMax: '19' },
    { rfqMin: '120' },
    { adfMax: '32', ndfMax: '55' },
    { nscMax: '12' },
    { forageType: 'alfalfa', priceMax: '225', sort: 'price' },
    { baleType: 'round_4x5', cutting: '2' },
    { harvestYear: '2025' },
    { tonsMin: '20' },
    { compliantOnly: 'true', verifiedOnly: 'true' },
    { zip: '66502', radiusMi: '200', sort: 'distance' },
    { zip: '66502', sort: 'distance', pageSize: '7', page: '3' },
    { zip: '67202', radiusMi: '150', sort: 'price_dm' },
    { page: '40' },
  ];

  it.each(QUERIES.map((q) => [new URLSearchParams(q).toString() || '(no filters)', q] as const))(
    'returns the same lots, order and total as the reference for %s',
    async (_name, raw) => {
      await expectSameAsReference(LotSearchSchema.parse({ q: tag, ...raw }));
    },
  );

  it('matches on the farm name as well as the title', async () => {
    const [farm] = await db.select({ name: farms.name }).from(farms).innerJoin(lots, eq(lots.farmId, farms.id)).where(sql`${lots.title} like ${tag + '%'}`).limit(1);
    const result = await service.search(LotSearchSchema.parse({ q: farm!.name, pageSize: '100' }));
    expect(result.items.length).toBeGreaterThan(0);
    expect(result.items.every((i) => i.farmName === farm!.name)).toBe(true);
  });

  it('follows every kind of change in the same transaction: price, stock, a new analysis, sampling, status and the farm moving', async () => {
    const [first, second, third] = await db.select({ id: lots.id, farmId: lots.farmId }).from(lots).where(and(sql`${lots.title} like ${tag + '%'}`, eq(lots.status, 'listed'))).orderBy(lots.id).limit(3);
    await db.transaction(async (tx) => {
      await tx.update(lots).set({ priceCentsPerTon: 9_900 }).where(eq(lots.id, first!.id));
      await tx.update(lots).set({ balesAvailable: 0 }).where(eq(lots.id, second!.id));
    });
    // A new current analysis replaces the old one, as the lot form does.
    await db.transaction(async (tx) => {
      const [old] = await tx.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, third!.id), eq(labAnalyses.isCurrent, true)));
      await tx.update(labAnalyses).set({ isCurrent: false }).where(eq(labAnalyses.id, old!.id));
      const { id: _id, createdAt: _c, ...copy } = old!;
      await tx.insert(labAnalyses).values({ ...copy, rfv: 399, crudeProteinPct: 30, isCurrent: true });
    });
    await db.update(samplingRecords).set({ compliant: false }).where(eq(samplingRecords.lotId, first!.id));
    const place = locateZip('80202');
    await db.update(farms).set({ latitude: place.latitude, longitude: place.longitude }).where(eq(farms.id, first!.farmId));

    for (const raw of [{ sort: 'price' }, { sort: 'rfv' }, { compliantOnly: 'true' }, { zip: '80202', radiusMi: '50', sort: 'distance' }, {}]) {
      await expectSameAsReference(LotSearchSchema.parse({ q: tag, pageSize: '100', ...raw }));
    }
    const cheapest = await service.search(LotSearchSchema.parse({ q: tag, sort: 'price' }));
    expect(cheapest.items[0]!.id).toBe(first!.id);
    const richest = await service.search(LotSearchSchema.parse({ q: tag, sort: 'rfv' }));
    expect(richest.items[0]).toMatchObject({ id: third!.id, rfv: 399, crudeProteinPct: 30 });

    await db.update(lots).set({ status: 'withdrawn' }).where(eq(lots.id, third!.id));
    const after = await service.search(LotSearchSchema.parse({ q: tag, pageSize: '100' }));
    expect(after.items.map((i) => i.id)).not.toContain(third!.id);
    await expectSameAsReference(LotSearchSchema.parse({ q: tag, pageSize: '100' }));
  });

  it(`counts exactly up to ${SEARCH_TOTAL_CAP} and says "more than" beyond (common practice for large result sets)`, async () => {
    // Many more lots under a second tag, made set-based: each a copy of one of the varied lots above.
    const many = `M${randomUUID().slice(0, 8)}`;
    await db.execute(sql`insert into lots (farm_id, title, field_name, cutting, forage_type, forage_class, harvest_started_on, harvest_ended_on,
        storage, bale_type, bale_count, bales_available, avg_bale_weight_lb, price_cents_per_ton, status, published_at)
      select l.farm_id, ${many} || ' lot ' || g, l.field_name, l.cutting, l.forage_type, l.forage_class, l.harvest_started_on, l.harvest_ended_on,
        l.storage, l.bale_type, l.bale_count, l.bale_count, l.avg_bale_weight_lb, l.price_cents_per_ton + g, 'listed', l.published_at
      from generate_series(1, ${SEARCH_TOTAL_CAP + 20}) g, (select * from lots where title like ${tag + '%'} order by id limit 1) l`);
    await db.execute(sql`insert into lab_analyses (lot_id, lab_name, lab_certified, report_date, dry_matter_pct, crude_protein_pct, adf_pct, ndf_pct,
        rfv, tdn_pct, tdn_method, de_mcal_per_kg_dm, de_method, usda_grade, verification)
      select l.id, a.lab_name, a.lab_certified, a.report_date, a.dry_matter_pct, a.crude_protein_pct - (l.id % 3), a.adf_pct, a.ndf_pct,
        a.rfv, a.tdn_pct, a.tdn_method, a.de_mcal_per_kg_dm, a.de_method, a.usda_grade, a.verification
      from lots l, (select * from lab_analyses where lot_id = (select min(id) from lots where title like ${tag + '%'}) and is_current) a
      where l.title like ${many + '%'}`);
    const all = await service.search(LotSearchSchema.parse({ q: many }));
    expect(all).toMatchObject({ total: SEARCH_TOTAL_CAP, totalCapped: true });
    // A filter that leaves about a third is counted exactly, and pages agree with the reference.
    const [{ cp }] = (await db.execute(sql`select max(crude_protein_pct) as cp from lab_analyses a join lots l on l.id = a.lot_id where l.title like ${many + '%'}`)).rows as [{ cp: number }];
    await expectSameAsReference(LotSearchSchema.parse({ q: many, cpMin: String(cp - 0.5), sort: 'price', page: '3' }));
    expect((await service.search(LotSearchSchema.parse({ q: many, cpMin: String(cp - 0.5) }))).totalCapped).toBe(false);
  });

  /** The reference: plain joins over the source tables, filtered and ordered here rather than in SQL. */
  async function reference(q: LotSearch): Promise<{ ids: number[]; total: number; distances: (number | null)[] }> {
    const rows = (
      await db.execute(sql`select l.id, l.title, f.name as farm_name, l.status, l.bales_available, l.avg_bale_weight_lb, l.price_cents_per_ton,
          l.forage_type, l.bale_type, l.cutting, l.harvest_started_on::text as harvest, l.published_at, f.latitude, f.longitude,
          a.dry_matter_pct, a.rfv, a.rfq, a.crude_protein_pct, a.adf_pct, a.ndf_pct, a.nsc_pct, a.verification, a.lab_certified, s.compliant
        from lots l join farms f on f.id = l.farm_id join lab_analyses a on a.lot_id = l.id and a.is_current
        left join sampling_records s on s.lot_id = l.id`)
    ).rows as unknown as ReferenceRow[];
    const origin = q.zip ? locateZip(q.zip) : null;
    const needle = q.q?.toLowerCase();
    const keep = rows
      .map((r) => ({ ...r, distance: origin ? haversineMiles({ lat: origin.latitude, lon: origin.longitude }, { lat: r.latitude, lon: r.longitude }) : null }))
      .filter((r) =>
        r.status === 'listed' && r.bales_available > 0 &&
        (!needle || r.title.toLowerCase().includes(needle) || r.farm_name.toLowerCase().includes(needle)) &&
        (q.rfvMin === undefined || r.rfv >= q.rfvMin) && (q.rfvMax === undefined || r.rfv <= q.rfvMax) &&
        (q.rfqMin === undefined || (r.rfq !== null && r.rfq >= q.rfqMin)) &&
        (q.cpMin === undefined || r.crude_protein_pct >= q.cpMin) && (q.cpMax === undefined || r.crude_protein_pct <= q.cpMax) &&
        (q.adfMax === undefined || r.adf_pct <= q.adfMax) && (q.ndfMax === undefined || r.ndf_pct <= q.ndfMax) &&
        (q.nscMax === undefined || (r.nsc_pct !== null && r.nsc_pct <= q.nscMax)) &&
        (!q.forageType || r.forage_type === q.forageType) && (!q.baleType || r.bale_type === q.baleType) &&
        (q.cutting === undefined || r.cutting === q.cutting) &&
        (q.harvestYear === undefined || Number(r.harvest.slice(0, 4)) === q.harvestYear) &&
        (q.priceMax === undefined || r.price_cents_per_ton <= q.priceMax * 100) &&
        (q.tonsMin === undefined || lbToShortTons(r.bales_available * r.avg_bale_weight_lb) >= q.tonsMin) &&
        (!q.compliantOnly || r.compliant === true) &&
        (!q.verifiedOnly || (r.verification === 'verified' && r.lab_certified)) &&
        (q.radiusMi === undefined || r.distance! <= q.radiusMi),
      );
    const key = (r: (typeof keep)[number]): number => {
      switch (q.sort) {
        case 'newest': return r.published_at === null ? -Infinity : -new Date(r.published_at).getTime();
        case 'price': return r.price_cents_per_ton;
        case 'price_dm': return r.price_cents_per_ton / (r.dry_matter_pct / 100);
        case 'rfv': return -r.rfv;
        case 'protein': return -r.crude_protein_pct;
        case 'distance': return r.distance!;
      }
    };
    keep.sort((a, b) => key(a) - key(b) || b.id - a.id);
    const page = keep.slice((q.page - 1) * q.pageSize, q.page * q.pageSize);
    return { ids: page.map((r) => r.id), total: keep.length, distances: page.map((r) => r.distance) };
  }

  async function expectSameAsReference(q: LotSearch): Promise<void> {
    const [got, want] = await Promise.all([service.search(q), reference(q)]);
    expect(got.items.map((i) => i.id)).toEqual(want.ids);
    expect(got.total).toBe(Math.min(want.total, SEARCH_TOTAL_CAP));
    expect(got.totalCapped).toBe(want.total > SEARCH_TOTAL_CAP);
    got.items.forEach((item, k) => (want.distances[k] === null ? expect(item.distanceMi).toBeNull() : expect(item.distanceMi).toBeCloseTo(want.distances[k]!, 6)));
  }
});

interface ReferenceRow {
  id: number;
  title: string;
  farm_name: string;
  status: string;
  bales_available: number;
  avg_bale_weight_lb: number;
  price_cents_per_ton: number;
  forage_type: string;
  bale_type: string;
  cutting: number;
  harvest: string;
  published_at: string | null;
  latitude: number;
  longitude: number;
  dry_matter_pct: number;
  rfv: number;
  rfq: number | null;
  crude_protein_pct: number;
  adf_pct: number;
  ndf_pct: number;
  nsc_pct: number | null;
  verification: string;
  lab_certified: boolean;
  compliant: boolean | null;
}

/** A small seeded PRNG (Mulberry32), so the varied data is the same on every run. */
function mulberry32(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
