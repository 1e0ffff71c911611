import fc from 'fast-check';
import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { convexHull, degreesToUnitVectors, hullLever, polygonAreaKm2 } from '../../src/sphere';

/** geographiclib on a sphere of the IUGG mean radius (flattening 0): an outside reference for areas. */
const sphere = new geodesic.Geodesic.Geodesic(6371008.8, 0);
function geographiclibAreaKm2(corners: ReadonlyArray<readonly [number, number]>): number {
  const polygon = sphere.Polygon(false);
  for (const [lat, lon] of corners) polygon.AddPoint(lat, lon);
  return Math.abs(polygon.Compute(false, true).area ?? NaN) / 1e6;
}

/** Hull area of the places (km²), 0 when they have no hull. */
function hullAreaOf(lat: Float64Array, lon: Float64Array): number {
  const hull = convexHull(degreesToUnitVectors(lat, lon));
  return hull.kind === 'hull' ? polygonAreaKm2(degreesToUnitVectors(lat, lon), hull.ring) : 0;
}

/** Brute-force leave-one-out: the hull of every place's complement, recomputed from scratch. */
function bruteForce(lat: Float64Array, lon: Float64Array): { area: number; without: number[]; remains: boolean[] } {
  const without: number[] = [];
  const remains: boolean[] = [];
  for (let i = 0; i < lat.length; i++) {
    const keep = (_: number, k: number) => k !== i;
    const restLat = lat.filter(keep), restLon = lon.filter(keep);
    remains.push(convexHull(degreesToUnitVectors(restLat, restLon)).kind === 'hull');
    without.push(hullAreaOf(restLat, restLon));
  }
  return { area: hullAreaOf(lat, lon), without, remains };
}

const ringOf = (lat: Float64Array, lon: Float64Array): Uint32Array | undefined => {
  const hull = convexHull(degreesToUnitVectors(lat, lon));
  return hull.kind === 'hull' ? hull.ring : undefined;
};

/** Distinct places: coordinates on a 0.5° lattice inside the given box, repeats dropped. */
const places = (maxLat: number, maxLon: number, maxLength: number) =>
  fc
    .array(fc.tuple(fc.integer({ min: -2 * maxLat, max: 2 * maxLat }), fc.integer({ min: -2 * maxLon, max: 2 * maxLon })), { minLength: 0, maxLength })
    .map((pairs) => {
      const seen = new Map(pairs.map(([a, b]) => [`${a},${b}`, [a / 2, b / 2] as const]));
      const list = [...seen.values()];
      return { lat: Float64Array.from(list, (p) => p[0]), lon: Float64Array.from(list, (p) => p[1]) };
    });

describe('the hull lever (leave-one-out on the convex hull)', () => {
  it('agrees with a brute-force leave-one-out on small random slices, inside and beyond one hemisphere', () => {
    for (const box of [[40, 50], [80, 170]] as const) {
      fc.assert(
        fc.property(places(box[0], box[1], 14), ({ lat, lon }) => {
          const lever = hullLever(degreesToUnitVectors(lat, lon), ringOf(lat, lon));
          if (ringOf(lat, lon) === undefined) {
            expect(lever).toEqual({ place: -1, withoutKm2: NaN });
            return;
          }
          const brute = bruteForce(lat, lon);
          const tolerance = 1e-9 * brute.area + 1e-6;
          const most = Math.max(...brute.without.map((w) => brute.area - w));
          expect(lever.place).toBeGreaterThanOrEqual(0);
          // The lever shrinks the hull as much as any place does (symmetric places may tie).
          expect(brute.area - brute.without[lever.place]).toBeGreaterThanOrEqual(most - tolerance);
          if (brute.remains[lever.place]) expect(Math.abs(lever.withoutKm2 - brute.without[lever.place])).toBeLessThan(tolerance);
          else expect(lever.withoutKm2).toBeNaN();
        }),
        { numRuns: 300 },
      );
    }
  });

  it('leaves no hull when the places left all lie on one meridian, though the ring had four vertices', () => {
    // Found by the property above: (0°, −0.5°) sits on the meridian edge between (±0.5°, −0.5°).
    const lat = Float64Array.of(0, 0, 0.5, -0.5), lon = Float64Array.of(-0.5, 0, -0.5, -0.5);
    const brute = bruteForce(lat, lon);
    const lever = hullLever(degreesToUnitVectors(lat, lon), ringOf(lat, lon));
    if (brute.remains[lever.place]) expect(Math.abs(lever.withoutKm2 - brute.without[lever.place])).toBeLessThan(1e-6);
    else expect(lever.withoutKm2).toBeNaN();
    expect(brute.remains[1]).toBe(false);
  });

  it('finds the one far place that doubles a slice hull, with the area left as geographiclib measures it', () => {
    // A 10° square of places (lat, lon) with one inside, and one far north at (30°N, 5°E). Worked
    // by hand: the triangle that place adds has a base of about 10° (the square's north side) and
    // a height of 20°, about the square's own area, so the hull about doubles; without it the hull
    // is the square. Only that place narrows the latitude span (30° → 10°).
    const corners = [[0, 0], [0, 10], [10, 10], [10, 0]] as const;
    const lat = Float64Array.of(0, 0, 10, 10, 5, 30);
    const lon = Float64Array.of(0, 10, 10, 0, 5, 5);
    const square = geographiclibAreaKm2(corners);
    const whole = geographiclibAreaKm2([[0, 0], [0, 10], [10, 10], [30, 5], [10, 0]]);
    expect(whole / square).toBeGreaterThan(1.9);
    expect(whole / square).toBeLessThan(2.1);
    const ring = ringOf(lat, lon);
    expect(polygonAreaKm2(degreesToUnitVectors(lat, lon), ring)).toBeCloseTo(whole, 0);
    const lever = hullLever(degreesToUnitVectors(lat, lon), ring);
    expect(lever.place).toBe(5);
    expect(lever.withoutKm2).toBeCloseTo(square, 0);
  });

  it('takes the first place when every removal leaves no hull (three places), and gives no area', () => {
    const lat = Float64Array.of(0, 0, 10), lon = Float64Array.of(0, 10, 0);
    expect(hullLever(degreesToUnitVectors(lat, lon), ringOf(lat, lon))).toEqual({ place: 0, withoutKm2: NaN });
  });

  it('gives a place strictly inside back to the hull: without a corner of a triangle, the hull is the other two and the inner place', () => {
    const corners = [[0, 0], [0, 20], [20, 0]] as const;
    const inner = [5, 5] as const;
    const lat = Float64Array.of(0, 0, 20, 5), lon = Float64Array.of(0, 20, 0, 5);
    const withoutCorner = corners.map((_, i) => geographiclibAreaKm2([...corners.filter((_, k) => k !== i), inner]));
    const smallest = Math.min(...withoutCorner);
    const lever = hullLever(degreesToUnitVectors(lat, lon), ringOf(lat, lon));
    expect(lever.place).toBe(withoutCorner.indexOf(smallest));
    expect(lever.withoutKm2).toBeCloseTo(smallest, 0);
  });

  it('has no lever without a hull', () => {
    expect(hullLever(degreesToUnitVectors(Float64Array.of(0, 1), Float64Array.of(0, 1)), undefined)).toEqual({ place: -1, withoutKm2: NaN });
  });
});
