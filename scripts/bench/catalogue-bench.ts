/**
 * Catalogue search benchmark: fills a scratch database with many listed lots, then times typical
 * GET /api/lots queries through LotsService.search and prints p50/p95 latencies and one query plan.
 *
 *   bash scripts/db.sh start && bash scripts/db.sh recreate baleproof_bench
 *   DATABASE_URL=postgres://postgres@127.0.0.1:54329/baleproof_bench node --import tsx server/db/migrate-cli.ts
 *   DATABASE_URL=postgres://postgres@127.0.0.1:54329/baleproof_bench node --import tsx scripts/bench/catalogue-bench.ts [lots]
 *
 * The figures are synthetic (random within hay ranges) and exist only to load the database.
 */
import { sql } from 'drizzle-orm';
import { performance } from 'node:perf_hooks';
import { LotSearchSchema } from '@shared/contracts/lots';
import { createDb } from '../../server/db/client';
import { LotsService } from '../../server/features/lots/lots.service';

const lotCount = Number(process.argv[2] ?? 20000);
const db = createDb(process.env['DATABASE_URL'] ?? 'postgres://postgres@127.0.0.1:54329/baleproof_bench', 2);

async function fill(): Promise<void> {
  const [{ n }] = (await db.execute(sql`select count(*)::int as n from lots`)).rows as [{ n: number }];
  if (n >= lotCount) return;
  const started = performance.now();
  await db.execute(sql`insert into users (email, password_hash, display_name, role)
    select 'bench' || g || '@bench.example', 'x', 'Bench grower ' || g, 'grower' from generate_series(1, 200) g
    on conflict do nothing`);
  // 200 farms scattered over the central US.
  await db.execute(sql`insert into farms (owner_id, name, address_line, city, state, zip, latitude, longitude)
    select u.id, 'Bench farm ' || u.id, 'Road', 'Town', 'KS', '66502', 35 + random() * 10, -102 + random() * 10
    from users u where u.email like 'bench%' and not exists (select 1 from farms f where f.owner_id = u.id)`);
  await db.execute(sql`insert into lots (farm_id, title, field_name, cutting, forage_type, forage_class, harvest_started_on, harvest_ended_on,
      storage, bale_type, bale_count, bales_available, avg_bale_weight_lb, price_cents_per_ton, status, published_at)
    select f.id, 'Bench lot ' || g, 'Field', 1 + (g % 4), (array['alfalfa','timothy','orchardgrass','bermudagrass','teff'])[1 + g % 5]::forage_type,
      (case when g % 5 = 0 then 'legume' else 'grass' end)::forage_class, date '2026-06-01', date '2026-06-02', 'barn',
      (array['small_square_2_string','round_4x5','large_square_3x4x8'])[1 + g % 3]::bale_type, 1000, (g % 7) * 100, 60,
      15000 + (g * 37) % 25000, (case when g % 10 = 0 then 'draft' else 'listed' end)::lot_status, now() - (g || ' minutes')::interval
    from generate_series(1, ${lotCount}) g join lateral (select id from farms where name like 'Bench farm%' order by id offset (g % 200) limit 1) f on true`);
  await db.execute(sql`insert into lab_analyses (lot_id, lab_name, lab_certified, report_date, dry_matter_pct, crude_protein_pct, adf_pct, ndf_pct,
      rfv, tdn_pct, tdn_method, de_mcal_per_kg_dm, de_method, nsc_pct, usda_grade, verification)
    select l.id, 'Bench lab', true, date '2026-07-01', 86 + random() * 5, 7 + random() * 17, 25 + random() * 12, 40 + random() * 25,
      80 + random() * 110, 55 + random() * 10, 'adf-western', 2 + random() * 0.7, 'tdn-approximation', 7 + random() * 8, 'Good', 'verified'
    from lots l where l.title like 'Bench lot%' and not exists (select 1 from lab_analyses a where a.lot_id = l.id)`);
  await db.execute(sql`analyze`);
  console.log(`filled ${lotCount} lots in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

const QUERIES: Record<string, Record<string, string>> = {
  'newest, first page': {},
  'RFV 150+ and CP 18+': { rfvMin: '150', cpMin: '18' },
  'alfalfa under $250/t, by price': { forageType: 'alfalfa', priceMax: '250', sort: 'price' },
  'within 100 mi of 66502, nearest': { zip: '66502', radiusMi: '100', sort: 'distance' },
  'NSC under 10, price per ton DM, page 5': { nscMax: '10', sort: 'price_dm', page: '5' },
};

async function main(): Promise<void> {
  await fill();
  const service = new LotsService(db);
  console.log(`\nquery (${lotCount} lots)`.padEnd(48) + 'total'.padStart(8) + 'p50 ms'.padStart(10) + 'p95 ms'.padStart(10));
  for (const [name, q] of Object.entries(QUERIES)) {
    const query = LotSearchSchema.parse(q);
    const times: number[] = [];
    let total = 0;
    for (let i = 0; i < 40; i++) {
      const t0 = performance.now();
      total = (await service.search(query)).total;
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const pct = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))]!.toFixed(1);
    console.log(name.padEnd(48) + String(total).padStart(8) + pct(0.5).padStart(10) + pct(0.95).padStart(10));
  }
  const plan = await db.execute(sql.raw(`explain (analyze, costs off, timing off, summary on)
    select l.id from lots l join lab_analyses a on a.lot_id = l.id and a.is_current
    where l.status = 'listed' and a.rfv >= 150 and a.crude_protein_pct >= 18 order by l.published_at desc limit 12`));
  console.log('\nplan for "RFV 150+ and CP 18+":');
  for (const row of plan.rows as { 'QUERY PLAN': string }[]) console.log('  ' + row['QUERY PLAN']);
}

main()
  .finally(() => db.$client.end())
  .catch((e) => {
    console.error(e);
    process.exitCode = 1;
  });
