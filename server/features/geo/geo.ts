import { sql, type AnyColumn, type SQL } from 'drizzle-orm';
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

/** The latitude and longitude columns of a row that sits at a farm (farms itself, or the catalogue's search rows). */
export interface FarmPlaceColumns {
  latitude: AnyColumn;
  longitude: AnyColumn;
}

/**
 * Great-circle miles from a place to each farm: haversine on the same sphere as `shared/pricing`
 * (`haversineMiles`). The `least(1, …)` clamp keeps `asin` in its domain when rounding lifts the
 * argument a hair above 1 (points nearly opposite on the globe); PostgreSQL would fail the query otherwise.
 */
export function farmDistanceSql(place: Pick<ZipPlace, 'latitude' | 'longitude'>, at: FarmPlaceColumns = farms): SQL<number> {
  const la = sql`${place.latitude}::float8`;
  const lo = sql`${place.longitude}::float8`;
  return sql<number>`(2 * ${EARTH_RADIUS_MI}::float8 * asin(least(1, sqrt(
    power(sin(radians(${at.latitude} - ${la}) / 2), 2) +
    cos(radians(${la})) * cos(radians(${at.latitude})) * power(sin(radians(${at.longitude} - ${lo}) / 2), 2)
  ))))`;
}

/**
 * Farms within `radiusMi` of a place: a latitude/longitude box first, which an index can answer (written
 * both as ranges, for the farms (latitude, longitude) b-tree, and as point-in-box, for the search rows'
 * GiST index on point(longitude, latitude)), then the exact distance. `exactLimit` replaces the radius in
 * the exact test when the limit depends on the row (a farm's own delivery radius); it must not exceed `radiusMi`.
 */
export function farmWithinSql(place: Pick<ZipPlace, 'latitude' | 'longitude'>, radiusMi: number, exactLimit?: SQL, at: FarmPlaceColumns = farms): SQL {
  const box = boundingBox({ lat: place.latitude, lon: place.longitude }, radiusMi);
  const limit = exactLimit ?? sql`${radiusMi}::float8`;
  return sql`(${at.latitude} between ${box.minLat}::float8 and ${box.maxLat}::float8
    and ${at.longitude} between ${box.minLon}::float8 and ${box.maxLon}::float8
    and point(${at.longitude}, ${at.latitude}) <@ box(point(${box.minLon}::float8, ${box.minLat}::float8), point(${box.maxLon}::float8, ${box.maxLat}::float8))
    and ${farmDistanceSql(place, at)} <= ${limit})`;
}
