import { randomUUID } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Client } from 'pg';

jest.setTimeout(120_000);

const DRIZZLE = join(__dirname, '..', 'drizzle');
const migrations = readdirSync(DRIZZLE).filter((f) => /^\d{4}_.*\.sql$/.test(f)).sort();

async function apply(db: Client, files: string[]) {
  for (const file of files) {
    for (const statement of readFileSync(join(DRIZZLE, file), 'utf8').split('--> statement-breakpoint')) if (statement.trim()) await db.query(statement);
  }
}

/**
 * Orders placed before an order could hold several lots keep everything when migrations 0013 and 0015
 * move their lot, bales, prices and scale ticket onto order lines: nothing may be lost (money, orders).
 */
describe('moving orders onto order lines (migrations 0013–0015)', () => {
  const name = `order_lines_migration_${randomUUID().slice(0, 8)}`;
  const url = new URL(process.env['TEST_DATABASE_URL']!);
  const admin = new Client({ connectionString: url.toString() });
  let db: Client;
  beforeAll(async () => {
    await admin.connect();
    await admin.query(`create database ${name}`);
    url.pathname = `/${name}`;
    db = new Client({ connectionString: url.toString() });
    await db.connect();
  });
  afterAll(async () => {
    await db?.end();
    await admin.query(`drop database if exists ${name}`);
    await admin.end();
  });

  it('gives every existing order one line with its lot, bales, tons, price, hay and weighed tons, and its claim that line', async () => {
    const before = migrations.filter((f) => Number(f.slice(0, 4)) < 13);
    await apply(db, before);
    await db.query(`insert into users (email, password_hash, display_name, role) values ('grower@example.test', 'x', 'Grower', 'grower'), ('buyer@example.test', 'x', 'Buyer', 'buyer')`);
    await db.query(`insert into farms (owner_id, name, address_line, city, state, zip, latitude, longitude, time_zone) values (1, 'Invented Farm', '1 Test Rd', 'Manhattan', 'KS', '66502', 39.2, -96.6, 'America/Chicago')`);
    await db.query(`insert into lots (farm_id, title, field_name, cutting, forage_type, forage_class, harvest_started_on, harvest_ended_on, storage, bale_type, bale_count, bales_available, avg_bale_weight_lb, price_cents_per_ton, status)
      values (1, 'Migrated alfalfa', 'Field', 1, 'alfalfa', 'legume', '2026-06-01', '2026-06-02', 'barn', 'small_square_2_string', 400, 250, 60, 30000, 'listed')`);
    // 100 bales of 60 lb = 3 t at $300/t = $900 + 3 % = $27; weighed 2.9 t.
    await db.query(`insert into orders (buyer_id, lot_id, farm_id, status, bales, tons, price_cents_per_ton, goods_cents, platform_fee_bps, platform_fee_cents, total_cents, method, weighed_tons)
      values (2, 1, 1, 'delivered', 100, 3, 30000, 90000, 300, 2700, 92700, 'pickup', 2.9)`);
    await db.query(`insert into quality_claims (order_id, opened_by, reason) values (1, 2, 'Mould inside the bales.')`);
    await apply(db, ['0013_order_lines.sql']);
    // An order written the old way between the two migrations still gets its line.
    await db.query(`insert into orders (buyer_id, lot_id, farm_id, status, bales, tons, price_cents_per_ton, goods_cents, platform_fee_bps, platform_fee_cents, total_cents, method)
      values (2, 1, 1, 'paid', 50, 1.5, 30000, 45000, 300, 1350, 46350, 'pickup')`);
    await apply(db, migrations.filter((f) => Number(f.slice(0, 4)) > 13));

    const { rows } = await db.query(`select o.id, o.total_cents, o.platform_fee_cents, l.lot_id, l.bales, l.tons, l.price_cents_per_ton, l.goods_cents, l.weighed_tons
      from orders o join order_lines l on l.order_id = o.id order by o.id`);
    expect(rows).toEqual([
      { id: 1, total_cents: 92700, platform_fee_cents: 2700, lot_id: 1, bales: 100, tons: 3, price_cents_per_ton: 30000, goods_cents: 90000, weighed_tons: 2.9 },
      { id: 2, total_cents: 46350, platform_fee_cents: 1350, lot_id: 1, bales: 50, tons: 1.5, price_cents_per_ton: 30000, goods_cents: 45000, weighed_tons: null },
    ]);
    const claims = await db.query(`select order_line_id from quality_claims`);
    expect(claims.rows).toEqual([{ order_line_id: 1 }]);
    // The per-lot columns are gone from orders: one home per fact.
    const columns = await db.query(`select column_name from information_schema.columns where table_name = 'orders' and column_name in ('lot_id', 'bales', 'tons', 'goods_cents', 'weighed_tons')`);
    expect(columns.rows).toEqual([]);
  });
});
