import { sql, type SQL } from 'drizzle-orm';
import zipcodes from 'zipcodes';
import { boundingBox, EARTH_RADIUS_MI } from '@shared/pricing/distance';
import { farms } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';

/** Where a US ZIP code lies: its place name and the coordinates distances are measured from. */
export interface ZipPlace {
  zip: string;
  city: string;
  state: string;
  latitude: number;
  longitude: number;
}

/** Latitude/longitude of a US ZIP code from the bundled `zipcodes` dataset, or a 400 naming the ZIP. */
export function locateZip(zip: string): ZipPlace {
  const found = zipcodes.lookup(zip);
  if (!found) throw new HttpError(400, 'unknown_zip', `ZIP code ${zip} is not in our list of US ZIP codes.`, [{ path: 'zip', message: 'Unknown ZIP code.' }]);
  return { zip, city: found.city, state: found.state, latitude: found.latitude, longitude: found.longitude };
}

/**
 * Great-circle miles from a place to each farm: haversine on the same sphere as `shared/pricing`
 * (`haversineMiles`). The `least(1, …)` clamp keeps `asin` in its domain when rounding lifts the
 * argument a hair above 1 (points nearly opposite on the globe); PostgreSQL would fail the query otherwise.
 */
export function farmDistanceSql(place: Pick<ZipPlace, 'latitude' | 'longitude'>): SQL<number> {
  const la = sql`${place.latitude}::float8`;
  const lo = sql`${place.longitude}::float8`;
  return sql<number>`(2 * ${EARTH_RADIUS_MI}::float8 * asin(least(1, sqrt(
    power(sin(radians(${farms.latitude} - ${la}) / 2), 2) +
    cos(radians(${la})) * cos(radians(${farms.latitude})) * power(sin(radians(${farms.longitude} - ${lo}) / 2), 2)
  ))))`;
}

/**
 * Farms within `radiusMi` of a place: a latitude/longitude box first, which the farms (latitude, longitude)
 * index can answer, then the exact distance. `exactLimit` replaces the radius in the exact test when the
 * limit depends on the row (e.g. the farm's own delivery radius); it must never exceed `radiusMi`.
 */
export function farmWithinSql(place: Pick<ZipPlace, 'latitude' | 'longitude'>, radiusMi: number, exactLimit?: SQL): SQL {
  const box = boundingBox({ lat: place.latitude, lon: place.longitude }, radiusMi);
  const limit = exactLimit ?? sql`${radiusMi}::float8`;
  return sql`(${farms.latitude} between ${box.minLat}::float8 and ${box.maxLat}::float8
    and ${farms.longitude} between ${box.minLon}::float8 and ${box.maxLon}::float8
    and ${farmDistanceSql(place)} <= ${limit})`;
}
