import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { geoCentroid } from 'd3-geo';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { CENTROID_UNDEFINED_BELOW, sphericalCentroid } from '../../src/sphere/spherical-centroid';

const of = (...pos: [number, number][]) => sphericalCentroid(degreesToUnitVectors(Float64Array.from(pos, (p) => p[0]), Float64Array.from(pos, (p) => p[1])));

describe('spherical centroid', () => {
  // Worked by hand: unit vectors (1, 0, 0) and (0, 1, 0); mean (½, ½, 0), length √2/2 = 0.7071;
  // direction lat 0°, lon atan2(½, ½) = 45°.
  it('lies halfway along the equator between 0° and 90°E', () => {
    const c = of([0, 0], [0, 90]);
    expect(c.latDeg).toBeCloseTo(0, 14);
    expect(c.lonDeg).toBeCloseTo(45, 13);
    expect(c.meanResultantLength).toBeCloseTo(Math.SQRT1_2, 15);
    expect(c.defined).toBe(true);
  });

  // Worked by hand: mean of (1, 0, 0), (0, 1, 0), (0, 0, 1) is (⅓, ⅓, ⅓), length 1/√3 = 0.57735;
  // lat = atan(⅓ / (√2/3)) = atan(1/√2) = 35.26439°, lon = 45°.
  it('lies at 35.26439°N 45°E for the corners of the first octant', () => {
    const c = of([0, 0], [0, 90], [90, 0]);
    expect(c.latDeg).toBeCloseTo(35.26439, 5);
    expect(c.lonDeg).toBeCloseTo(45, 13);
    expect(c.meanResultantLength).toBeCloseTo(1 / Math.sqrt(3), 15);
  });

  // Worked by hand: (10°N, 170°E) and (10°N, 170°W) average to x = −cos²10°, y = 0, z = sin 10°,
  // so tan(lat) = tan 10° / cos 10° = 0.176327 / 0.984808 = 0.179047, lat = 10.1511°, lon = 180°.
  it('sits on the antimeridian, a little poleward, for two points either side of it', () => {
    const c = of([10, 170], [10, -170]);
    expect(c.latDeg).toBeCloseTo(10.1511, 4);
    expect(Math.abs(c.lonDeg)).toBeCloseTo(180, 12);
  });

  it('is the point itself for one point, the pole included', () => {
    const c = of([-90, 123]);
    expect(c.latDeg).toBe(-90);
    expect(c.meanResultantLength).toBe(1);
  });

  it('has no direction for antipodal points, points spread evenly round the equator, or no points', () => {
    for (const c of [of([20, 30], [-20, -150]), of([0, 0], [0, 90], [0, 180], [0, -90]), of()]) {
      expect(c.defined).toBe(false);
      expect(c.latDeg).toBeNaN();
      expect(c.lonDeg).toBeNaN();
      expect(c.meanResultantLength).toBeLessThan(CENTROID_UNDEFINED_BELOW);
    }
  });

  // Reference: d3-geo's geoCentroid of a MultiPoint, which is the same normalised mean of unit
  // vectors (d3-geo src/centroid.js), computed by independent code.
  it('agrees with d3-geo’s geoCentroid for random point sets (property)', () => {
    const position = fc.tuple(fc.double({ min: -90, max: 90, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }));
    fc.assert(fc.property(fc.array(position, { minLength: 1, maxLength: 50 }), (pos) => {
      const ours = of(...pos);
      fc.pre(ours.meanResultantLength > 1e-6);
      const [lon, lat] = geoCentroid({ type: 'MultiPoint', coordinates: pos.map(([la, lo]) => [lo, la]) });
      expect(Math.abs(ours.latDeg - lat)).toBeLessThan(1e-7);
      const dLon = Math.abs(ours.lonDeg - lon);
      expect(Math.min(dLon, 360 - dLon) * Math.cos(lat * (Math.PI / 180))).toBeLessThan(1e-7);
      expect(ours.meanResultantLength).toBeLessThanOrEqual(1 + 1e-15);
    }), { numRuns: 500, seed: 91 });
  });
});
