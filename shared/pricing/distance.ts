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

/** Latitude and longitude limits (degrees) that contain every point within a radius of a centre. */
export interface BoundingBox {
  readonly minLat: number;
  readonly maxLat: number;
  readonly minLon: number;
  readonly maxLon: number;
}

/**
 * The smallest latitude/longitude box holding the circle of `radiusMi` around `center` on the haversine
 * sphere (bounding coordinates after J. P. Matuschek, 2010): lets an index on latitude and longitude
 * discard far rows before the exact distance is computed. Near a pole or across the antimeridian the
 * longitude limits open to the full −180…180, so the box never leaves a point out.
 */
export function boundingBox(center: LatLon, radiusMi: number): BoundingBox {
  check(center, 'center');
  if (!(radiusMi >= 0)) throw new RangeError(`radiusMi must be zero or more; got ${radiusMi}`);
  const angular = radiusMi / EARTH_RADIUS_MI;
  const lat = toRadians(center.lat);
  const minLat = lat - angular;
  const maxLat = lat + angular;
  // A margin of 1e-9 degrees (about 0.1 mm) absorbs floating-point rounding at the box's edges.
  const toDegrees = (radians: number) => (radians * 180) / Math.PI;
  const margin = 1e-9;
  if (minLat <= -Math.PI / 2 || maxLat >= Math.PI / 2) {
    return { minLat: Math.max(-90, toDegrees(minLat) - margin), maxLat: Math.min(90, toDegrees(maxLat) + margin), minLon: -180, maxLon: 180 };
  }
  const dLon = toDegrees(Math.asin(Math.min(1, Math.sin(angular) / Math.cos(lat)))) + margin;
  const minLon = center.lon - dLon;
  const maxLon = center.lon + dLon;
  const lats = { minLat: toDegrees(minLat) - margin, maxLat: toDegrees(maxLat) + margin };
  if (minLon < -180 || maxLon > 180) return { ...lats, minLon: -180, maxLon: 180 };
  return { ...lats, minLon, maxLon };
}
