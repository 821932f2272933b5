import { sql, type SQL } from 'drizzle-orm';
import { EARTH_RADIUS_MI } from '@shared/pricing/distance';
import { farms } from '../../db/schema';

/** Great-circle miles from a point to each farm (haversine, the same sphere as shared/pricing). */
export function farmDistanceSql(lat: number, lon: number): SQL<number> {
  const la = sql`${lat}::float8`;
  const lo = sql`${lon}::float8`;
  return sql<number>`(2 * ${EARTH_RADIUS_MI}::float8 * asin(least(1, sqrt(
    power(sin(radians(${farms.latitude} - ${la}) / 2), 2) +
    cos(radians(${la})) * cos(radians(${farms.latitude})) * power(sin(radians(${farms.longitude} - ${lo}) / 2), 2)
  ))))`;
}
