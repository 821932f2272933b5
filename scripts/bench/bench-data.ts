import { sql } from 'drizzle-orm';
import type { Db } from '../../server/db/client';
import { refreshStoredSamplingVerdicts } from '../../server/features/lots/sampling-report';

/**
 * Fills an empty, migrated database with synthetic catalogue data in a few set-based statements
 * (INSERT … SELECT over generate_series): `farmCount` farms scattered over the central US and `lotCount`
 * lots round-robin over them, 90 % listed (one in seven of those sold out), each with a current analysis
 * whose figures are random within usual hay ranges and, for two lots in three, a sampling record with its verdict.
 * The figures exist only to load the database; they are not forage data.
 */
export async function fillBenchData(db: Db, lotCount: number, farmCount = 2000): Promise<void> {
  await db.execute(sql`select setseed(0.42)`);
  await db.execute(sql`insert into users (email, password_hash, display_name, role)
    select 'bench' || g || '@bench.example', 'x', 'Bench grower ' || g, 'grower' from generate_series(1, ${farmCount}) g`);
  await db.execute(sql`insert into farms (owner_id, name, address_line, city, state, zip, time_zone, latitude, longitude)
    select u.id, 'Bench farm ' || u.id, 'Road', 'Town', 'KS', '66502', 'America/Chicago', 33 + random() * 13, -104 + random() * 16
    from users u where u.email like 'bench%@bench.example' order by u.id`);
  await db.execute(sql`insert into lots (farm_id, title, field_name, cutting, forage_type, forage_class, harvest_started_on, harvest_ended_on,
      storage, bale_type, bale_count, bales_available, avg_bale_weight_lb, price_cents_per_ton, status, published_at)
    select f0.first + g % ${farmCount}, 'Bench lot ' || g, 'Field', 1 + (g % 4),
      (array['alfalfa','timothy','orchardgrass','bermudagrass','teff','alfalfa_grass_mix','grass_mix'])[1 + g % 7]::forage_type,
      (array['legume','grass','grass','grass','grass','mixed','grass'])[1 + g % 7]::forage_class,
      date '2025-06-01' + (g % 400), date '2025-06-02' + (g % 400), 'barn',
      (array['small_square_2_string','round_4x5','large_square_3x4x8'])[1 + g % 3]::bale_type, 1000,
      case when g % 7 = 3 then 0 else 50 + (g * 13) % 950 end, 40 + (g % 12) * 80,
      12000 + (g * 37) % 28000,
      (case when g % 10 = 0 then 'draft' else 'listed' end)::lot_status,
      case when g % 10 = 0 then null else timestamptz '2026-11-30 12:00Z' - (g || ' minutes')::interval end
    from generate_series(1, ${lotCount}) g, (select min(id) as first from farms) f0`);
  await db.execute(sql`insert into lab_analyses (lot_id, lab_name, lab_certified, report_date, dry_matter_pct, crude_protein_pct, adf_pct, ndf_pct,
      rfv, rfq, tdn_pct, tdn_method, de_mcal_per_kg_dm, de_method, nsc_pct, usda_grade, verification)
    select l.id, 'Bench lab', l.id % 9 <> 0, date '2026-07-01', 86 + random() * 5, 7 + random() * 17, 25 + random() * 12, 40 + random() * 25,
      80 + random() * 110, case when l.id % 3 = 0 then null else 80 + random() * 120 end, 55 + random() * 10, 'adf-western',
      2 + random() * 0.7, 'tdn-approximation', case when l.id % 5 = 0 then null else 7 + random() * 8 end, 'Good',
      (case when l.id % 6 = 0 then 'pending' else 'verified' end)::verification_state
    from lots l`);
  await db.execute(sql`insert into sampling_records (lot_id, sampled_on, cores_taken, bales_sampled, probe_diameter_in, probe_length_in,
      core_position, sampled_by, compliant)
    select l.id, date '2026-06-28', 20, 20, 0.5, 18, 'butt-end-centre', 'Bench', l.id % 4 <> 0 from lots l where l.id % 3 <> 0`);
  // The verdicts the app itself would store: otherwise the server's start-up refresh rewrites them while the
  // load runs, and every page of rewrites empties the catalogue caches being measured.
  await refreshStoredSamplingVerdicts(db, new Date());
  await db.execute(sql`vacuum analyze`);
}
