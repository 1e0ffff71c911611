import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import geodesic from 'geographiclib-geodesic';
import { centralAngle, unitVectorAngle } from '../../src/sphere/distance';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { EARTH_RADIUS_KM, RADIANS } from '../../src/sphere/earth';
import { greatCircleDistanceKm } from './distance-km';

// Reference: GeographicLib (Karney 2013, J. Geodesy 87) solving the inverse geodesic problem on a
// sphere of the same radius (flattening 0), where geodesics are great circles. s12 is in metres.
const sphere = new geodesic.Geodesic.Geodesic(EARTH_RADIUS_KM * 1000, 0);
const referenceKm = (lat1: number, lon1: number, lat2: number, lon2: number) =>
  sphere.Inverse(lat1, lon1, lat2, lon2).s12! / 1000;

// Agreement to 1e-9 km (1 µm) or 1e-13 relative, whichever is larger: both sides are accurate to
// a few rounding errors of the central angle, ~1e-16 × 20,000 km.
function closeTo(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.max(1e-9, 1e-13 * expected));
}

const lat = fc.double({ min: -90, max: 90, noNaN: true });
const lon = fc.double({ min: -180, max: 180, noNaN: true });

describe('great-circle distance', () => {
  it('agrees with GeographicLib on a sphere for random pairs', () => {
    fc.assert(fc.property(lat, lon, lat, lon, (a, b, c, d) => {
      closeTo(greatCircleDistanceKm(a, b, c, d), referenceKm(a, b, c, d));
    }),
      { numRuns: 2000, seed: 1 });
  });

  it('agrees with GeographicLib for nearly antipodal pairs', () => {
    const offset = fc.double({ min: -1e-3, max: 1e-3, noNaN: true });
    fc.assert(fc.property(lat, lon, offset, offset, (a, b, da, db) => {
      const c = Math.max(-90, Math.min(90, -a + da));
      const d = b > 0 ? b - 180 + db : b + 180 + db;
      closeTo(greatCircleDistanceKm(a, b, c, d), referenceKm(a, b, c, d));
    }), { numRuns: 1000, seed: 2 });
  });

  it('agrees with GeographicLib for pairs a few millimetres to a few metres apart', () => {
    const offset = fc.double({ min: -1e-4, max: 1e-4, noNaN: true });
    const midLat = fc.double({ min: -89, max: 89, noNaN: true });
    fc.assert(fc.property(midLat, lon, offset, offset, (a, b, da, db) => {
      closeTo(greatCircleDistanceKm(a, b, a + da, b + db), referenceKm(a, b, a + da, b + db));
    }), { numRuns: 1000, seed: 3 });
  });

  it('is zero for coincident positions, including the same pole at two longitudes and ±180°', () => {
    expect(greatCircleDistanceKm(12.5, 40, 12.5, 40)).toBe(0);
    expect(greatCircleDistanceKm(90, 10, 90, -120)).toBeLessThan(1e-12);
    expect(greatCircleDistanceKm(-33, 180, -33, -180)).toBeLessThan(1e-9);
  });

  it('gives half the circumference, πR, between antipodes (closed form)', () => {
    closeTo(greatCircleDistanceKm(0, 0, 0, 180), Math.PI * EARTH_RADIUS_KM);
    closeTo(greatCircleDistanceKm(90, 0, -90, 0), Math.PI * EARTH_RADIUS_KM);
    closeTo(greatCircleDistanceKm(30, 40, -30, -140), Math.PI * EARTH_RADIUS_KM);
  });

  it('gives a quarter meridian, πR/2, from the equator to a pole (closed form)', () => {
    closeTo(greatCircleDistanceKm(0, 77, 90, 0), (Math.PI / 2) * EARTH_RADIUS_KM);
  });

  it('measures the same angle from unit vectors as from radians', () => {
    fc.assert(fc.property(lat, lon, lat, lon, (a, b, c, d) => {
      const xyz = degreesToUnitVectors(Float64Array.of(a, c), Float64Array.of(b, d));
      const angle = centralAngle(a * RADIANS, b * RADIANS, c * RADIANS, d * RADIANS);
      expect(Math.abs(unitVectorAngle(xyz, 0, 1) - angle)).toBeLessThan(1e-15);
    }), { numRuns: 500, seed: 4 });
  });

  it('is symmetric in its two positions', () => {
    fc.assert(fc.property(lat, lon, lat, lon, (a, b, c, d) => {
      expect(greatCircleDistanceKm(a, b, c, d)).toBe(greatCircleDistanceKm(c, d, a, b));
    }), { numRuns: 300, seed: 5 });
  });
});
