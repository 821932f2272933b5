import { eq, sql } from 'drizzle-orm';
import { haversineMiles } from '@shared/pricing/distance';
import { farms } from '../../db/schema';
import { createDb, type Db } from '../../db/client';
import { createGrower } from '../../../tests/support/fixtures';
import { farmDistanceSql, farmWithinSql, locateZip } from './geo';

describe('geo', () => {
  let db: Db;
  let farmId: number;

  beforeAll(async () => {
    db = createDb(process.env['TEST_DATABASE_URL']!, 2);
    farmId = (await createGrower(db, '66502')).farm.id;
  });
  afterAll(() => db.$client.end());

  /** Moves the fixture farm, then asks PostgreSQL for its distance and whether it lies within the radius. */
  async function measure(farm: { lat: number; lon: number }, origin: { lat: number; lon: number }, radiusMi: number) {
    await db.update(farms).set({ latitude: farm.lat, longitude: farm.lon }).where(eq(farms.id, farmId));
    const place = { latitude: origin.lat, longitude: origin.lon };
    const [row] = await db
      .select({ miles: farmDistanceSql(place), within: sql<boolean>`${farmWithinSql(place, radiusMi)}` })
      .from(farms)
      .where(eq(farms.id, farmId));
    return { miles: Number(row!.miles), within: row!.within };
  }

  it('locates a ZIP code and answers 400 for one it does not know (zipcodes dataset: 66502 is Manhattan, KS)', () => {
    expect(locateZip('66502')).toMatchObject({ city: 'Manhattan', state: 'KS' });
    expect(() => locateZip('00000')).toThrow(expect.objectContaining({ status: 400, code: 'unknown_zip' }));
  });

  it('measures in SQL what haversineMiles measures in TypeScript, on nearby, far and opposite points', async () => {
    const origin = { lat: 39.19, lon: -96.6 };
    const farmsAt = [
      { lat: 39.19, lon: -96.6 },
      { lat: 40.59, lon: -98.39 },
      { lat: 33.9425, lon: -118.4081 },
      { lat: -39.19, lon: 83.4 }, // the antipode: the asin argument reaches 1, which the clamp keeps in range
      { lat: -2.7593285081486556, lon: 158.13008398678039 },
    ];
    for (const farm of farmsAt) {
      const o = farm.lat === -2.7593285081486556 ? { lat: 2.7593285081486556, lon: -21.86991601321961 } : origin;
      const { miles } = await measure(farm, o, 100);
      expect(miles).toBeCloseTo(haversineMiles(o, farm), 6);
    }
  });

  it('finds a farm within the radius exactly when haversineMiles says so, including across the box corners', async () => {
    const origin = { lat: 45, lon: -100 };
    // Points on a ring around the origin, just inside and just outside 150 mi (a box alone would keep the corners).
    for (const bearingDeg of [0, 45, 90, 135, 225, 315]) {
      for (const miles of [149.9, 150.1, 200]) {
        const d = miles / 3958.8;
        const b = (bearingDeg * Math.PI) / 180;
        const la = (origin.lat * Math.PI) / 180;
        const lat2 = Math.asin(Math.sin(la) * Math.cos(d) + Math.cos(la) * Math.sin(d) * Math.cos(b));
        const lon2 = (origin.lon * Math.PI) / 180 + Math.atan2(Math.sin(b) * Math.sin(d) * Math.cos(la), Math.cos(d) - Math.sin(la) * Math.sin(lat2));
        const farm = { lat: (lat2 * 180) / Math.PI, lon: (lon2 * 180) / Math.PI };
        const { within } = await measure(farm, origin, 150);
        expect(within).toBe(haversineMiles(origin, farm) <= 150);
      }
    }
  });
});
