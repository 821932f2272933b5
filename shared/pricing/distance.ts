/** A point on the Earth in decimal degrees (WGS 84 latitude/longitude). */
export interface LatLon {
  /** Latitude, degrees, −90 to 90 (north positive). */
  readonly lat: number;
  /** Longitude, degrees, −180 to 180 (east positive). */
  readonly lon: number;
}

/**
 * Mean Earth radius in statute miles (IUGG mean radius 6,371.0 km). The sphere is off from the
 * ellipsoid by up to ~0.5 %, plenty for estimating freight; road miles run 10–30 % longer.
 */
export const EARTH_RADIUS_MI = 3958.8;

const toRadians = (degrees: number): number => (degrees * Math.PI) / 180;

function check(point: LatLon, name: string): void {
  if (!(point.lat >= -90 && point.lat <= 90)) throw new RangeError(`${name}.lat must be between -90 and 90; got ${point.lat}`);
  if (!(point.lon >= -180 && point.lon <= 180)) throw new RangeError(`${name}.lon must be between -180 and 180; got ${point.lon}`);
}

/**
 * Great-circle ("as the crow flies") distance in statute miles between two points, by the
 * haversine formula on a sphere of radius {@link EARTH_RADIUS_MI}.
 */
export function haversineMiles(from: LatLon, to: LatLon): number {
  check(from, 'from');
  check(to, 'to');
  const dLat = toRadians(to.lat - from.lat);
  const dLon = toRadians(to.lon - from.lon);
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(toRadians(from.lat)) * Math.cos(toRadians(to.lat)) * Math.sin(dLon / 2) ** 2;
  // Clamp: rounding can push h a hair above 1 for antipodal points.
  return 2 * EARTH_RADIUS_MI * Math.asin(Math.sqrt(Math.min(1, h)));
}
