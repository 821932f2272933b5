import fc from 'fast-check';
import { boundingBox, haversineMiles, type LatLon } from './distance';

// IUGG mean Earth radius 6,371.0088 km; 1 mi = 1.609 344 km exactly (NIST) → 3,958.76 mi. On it one degree of a great
// circle is 69.09 mi, a quarter circle 6,218.4 mi and half 12,436.8 mi.
const MEAN_RADIUS_MI = 6371.0088 / 1.609344;

const point = fc.record({ lat: fc.double({ min: -90, max: 90, noNaN: true }), lon: fc.double({ min: -180, max: 180, noNaN: true }) });

describe('haversineMiles', () => {
  it('is zero for the same point', () => {
    expect(haversineMiles({ lat: 39.1, lon: -94.6 }, { lat: 39.1, lon: -94.6 })).toBe(0);
  });

  it('gives one degree of latitude ≈ 69.09 mi, a quarter of the equator ≈ 6,218 mi and pole to pole ≈ 12,437 mi (IUGG mean radius)', () => {
    expect(haversineMiles({ lat: 0, lon: 0 }, { lat: 1, lon: 0 })).toBeCloseTo(69.09, 1);
    expect(haversineMiles({ lat: 0, lon: 0 }, { lat: 0, lon: 90 })).toBeCloseTo(6218.4, 0);
    expect(haversineMiles({ lat: 90, lon: 0 }, { lat: -90, lon: 0 })).toBeCloseTo(12436.8, 0);
  });

  it('puts LAX–JFK at about 2,470 mi (commonly quoted ≈2,475 mi great-circle; from memory, within 1 %)', () => {
    const lax: LatLon = { lat: 33.9425, lon: -118.4081 };
    const jfk: LatLon = { lat: 40.6398, lon: -73.7789 };
    expect(Math.abs(haversineMiles(lax, jfk) - 2475) / 2475).toBeLessThan(0.01);
  });

  it('crosses the antimeridian the short way', () => {
    expect(haversineMiles({ lat: 0, lon: 179.5 }, { lat: 0, lon: -179.5 })).toBeCloseTo(69.09, 1);
  });

  it('is symmetric, non-negative and within half the circumference (property)', () => {
    fc.assert(
      fc.property(point, point, (a, b) => {
        const d = haversineMiles(a, b);
        expect(d).toBeGreaterThanOrEqual(0);
        expect(d).toBeLessThanOrEqual(12437.5);
        expect(haversineMiles(b, a)).toBeCloseTo(d, 6);
      }),
    );
  });

  it('obeys the triangle inequality (property)', () => {
    fc.assert(
      fc.property(point, point, point, (a, b, c) => {
        // asin(√x) loses precision near antipodal points (x → 1), so allow 0.001 mi of floating-point slack.
        expect(haversineMiles(a, c)).toBeLessThanOrEqual(haversineMiles(a, b) + haversineMiles(b, c) + 1e-3);
      }),
    );
  });

  it('rejects coordinates out of range', () => {
    expect(() => haversineMiles({ lat: 91, lon: 0 }, { lat: 0, lon: 0 })).toThrow(RangeError);
    expect(() => haversineMiles({ lat: 0, lon: 0 }, { lat: 0, lon: 181 })).toThrow(RangeError);
    expect(() => haversineMiles({ lat: Number.NaN, lon: 0 }, { lat: 0, lon: 0 })).toThrow(RangeError);
  });
});

describe('boundingBox', () => {
  const inside = (box: ReturnType<typeof boundingBox>, p: LatLon) => p.lat >= box.minLat && p.lat <= box.maxLat && p.lon >= box.minLon && p.lon <= box.maxLon;

  it('spans the radius north and south: 69.09 mi is one degree of latitude (IUGG mean radius)', () => {
    const box = boundingBox({ lat: 39, lon: -96 }, 69.09);
    expect(box.minLat).toBeCloseTo(38, 2);
    expect(box.maxLat).toBeCloseTo(40, 2);
  });

  it('at the equator spans the same angle east and west as north and south', () => {
    const box = boundingBox({ lat: 0, lon: 10 }, 100);
    expect(box.maxLon - 10).toBeCloseTo(box.maxLat, 6);
  });

  it('opens the longitudes over a pole and across the antimeridian', () => {
    expect(boundingBox({ lat: 89.5, lon: 0 }, 100)).toMatchObject({ minLon: -180, maxLon: 180, maxLat: 90 });
    expect(boundingBox({ lat: 60, lon: 179.9 }, 50)).toMatchObject({ minLon: -180, maxLon: 180 });
  });

  it('holds every point within the radius (property, against haversineMiles)', () => {
    fc.assert(
      fc.property(point, point, fc.double({ min: 0, max: 3000, noNaN: true }), (center, p, radius) => {
        if (haversineMiles(center, p) <= radius) expect(inside(boundingBox(center, radius), p)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it('holds the points on the circle itself, in every direction (property)', () => {
    fc.assert(
      fc.property(
        fc.record({ lat: fc.double({ min: -80, max: 80, noNaN: true }), lon: fc.double({ min: -170, max: 170, noNaN: true }) }),
        fc.double({ min: 1, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        (center, radius, bearing) => {
          // Destination point on the sphere (standard great-circle formula), slightly inside the circle.
          const d = (radius * 0.999) / MEAN_RADIUS_MI;
          const la = (center.lat * Math.PI) / 180;
          const lo = (center.lon * Math.PI) / 180;
          const lat2 = Math.asin(Math.sin(la) * Math.cos(d) + Math.cos(la) * Math.sin(d) * Math.cos(bearing));
          const lon2 = lo + Math.atan2(Math.sin(bearing) * Math.sin(d) * Math.cos(la), Math.cos(d) - Math.sin(la) * Math.sin(lat2));
          const p = { lat: (lat2 * 180) / Math.PI, lon: (lon2 * 180) / Math.PI };
          expect(inside(boundingBox(center, radius), p)).toBe(true);
        },
      ),
    );
  });
});
