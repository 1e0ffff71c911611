import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { geoContains } from 'd3-geo';
import { geoDelaunay } from 'd3-geo-voronoi';
import geodesic from 'geographiclib-geodesic';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { convexHull, type ConvexHull } from '../../src/sphere/convex-hull';
import { polygonAreaKm2 } from '../../src/sphere/polygon-area';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';

const RAD = Math.PI / 180;
type V = [number, number, number];
const vec = (lat: number, lon: number): V => [Math.cos(lat * RAD) * Math.cos(lon * RAD), Math.cos(lat * RAD) * Math.sin(lon * RAD), Math.sin(lat * RAD)];
/** Signed triple product a · (b × c): positive when a → b → c turns left seen from outside. */
const triple = (a: V, b: V, c: V) =>
  a[0] * (b[1] * c[2] - b[2] * c[1]) + a[1] * (b[2] * c[0] - b[0] * c[2]) + a[2] * (b[0] * c[1] - b[1] * c[0]);

function ringOf(hull: ConvexHull): Uint32Array {
  if (hull.kind !== 'hull') throw new Error(`expected a hull, got none: ${hull.reason}`);
  return hull.ring;
}

/**
 * Checks a hull by facts that do not depend on how it was found: its vertices are distinct input
 * rows; every corner turns left (a convex ring, counter-clockwise seen from outside); every input
 * point is on the inner side of every edge's great circle (signed triple products); and d3-geo's
 * geoContains, on the ring rewound clockwise as d3 wants it, holds the points clear of the edges.
 */
function expectValidHull(lat: Float64Array, lon: Float64Array, ring: Uint32Array): void {
  const n = lat.length, m = ring.length;
  expect(m).toBeGreaterThanOrEqual(3);
  expect(new Set(ring).size).toBe(m);
  for (const r of ring) expect(r).toBeLessThan(n);
  const v = Array.from({ length: n }, (_, i) => vec(lat[i], lon[i]));
  for (let k = 0; k < m; k++) {
    expect(triple(v[ring[k]], v[ring[(k + 1) % m]], v[ring[(k + 2) % m]])).toBeGreaterThan(0);
  }
  const polygon = { type: 'Polygon' as const, coordinates: [[...ring, ring[0]].reverse().map((r) => [lon[r], lat[r]])] };
  for (let i = 0; i < n; i++) {
    let clearance = Infinity;
    for (let k = 0; k < m; k++) clearance = Math.min(clearance, triple(v[ring[k]], v[ring[(k + 1) % m]], v[i]));
    expect(clearance).toBeGreaterThan(-1e-12);
    if (clearance > 1e-9) expect(geoContains(polygon, [lon[i], lat[i]])).toBe(true);
  }
}

/** Random positions within `radiusDeg` of a centre, uniform in area, as in a random footprint. */
function capSample(seed: number, n: number, centreLat: number, centreLon: number, radiusDeg: number) {
  const line = new geodesic.Geodesic.Geodesic(1, 0);
  let s = seed >>> 0 || 1;
  const next = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
  const lat = new Float64Array(n), lon = new Float64Array(n);
  const cosR = Math.cos(radiusDeg * RAD);
  for (let i = 0; i < n; i++) {
    const distance = Math.acos(1 - next() * (1 - cosR));
    const p = line.Direct(centreLat, centreLon, 360 * next() - 180, distance);
    lat[i] = p.lat2!;
    lon[i] = p.lon2!;
  }
  return { lat, lon };
}

describe('convex hull', () => {
  it('holds every point, turns left at every corner and uses input points as vertices, for random footprints (property)', () => {
    fc.assert(fc.property(
      fc.integer(), fc.integer({ min: 3, max: 400 }), fc.double({ min: -90, max: 90, noNaN: true }),
      fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: 0.001, max: 85, noNaN: true }),
      (seed, n, cLat, cLon, radius) => {
        const { lat, lon } = capSample(seed, n, cLat, cLon, radius);
        expectValidHull(lat, lon, ringOf(convexHull(degreesToUnitVectors(lat, lon))));
      },
    ), { numRuns: 200, seed: 61 });
  });

  // Reference: d3-geo-voronoi's geoDelaunay, whose hull comes from a stereographic Delaunay
  // triangulation (a different method): the same vertices, listed in the opposite turn.
  it('has the same vertices as d3-geo-voronoi’s hull, in the opposite order', () => {
    for (const [seed, cLat, cLon, radius] of [[1, 10, 170, 40], [2, -60, -30, 25], [3, 85, 0, 30], [4, 0, 0, 0.01]]) {
      const { lat, lon } = capSample(seed, 200, cLat, cLon, radius);
      const ours = Array.from(ringOf(convexHull(degreesToUnitVectors(lat, lon))));
      const theirs = geoDelaunay(Array.from(lat, (_, i): [number, number] => [lon[i], lat[i]])).hull;
      expect(new Set(ours)).toEqual(new Set(theirs));
      const start = theirs.indexOf(ours[0]);
      const rotated = [...theirs.slice(start), ...theirs.slice(0, start)];
      expect([rotated[0], ...rotated.slice(1).reverse()]).toEqual(ours);
    }
  });

  // Reference: GeographicLib's PolygonArea on a sphere of the same radius (flattening 0).
  it('encloses the area GeographicLib gives for the same ring', () => {
    const sphere = new geodesic.Geodesic.Geodesic(EARTH_RADIUS_KM * 1000, 0);
    for (const [seed, cLat, cLon, radius] of [[5, 30, -179, 60], [6, -89, 40, 20], [7, 45, 7, 0.5], [8, 0, 90, 84]]) {
      const { lat, lon } = capSample(seed, 500, cLat, cLon, radius);
      const ring = ringOf(convexHull(degreesToUnitVectors(lat, lon)));
      const polygon = sphere.Polygon(false);
      for (const r of ring) polygon.AddPoint(lat[r], lon[r]);
      const reference = polygon.Compute(false, true).area! / 1e6;
      expect(reference).toBeGreaterThan(0);
      expect(Math.abs(polygonAreaKm2(degreesToUnitVectors(lat, lon), ring) - reference)).toBeLessThanOrEqual(1e-9 * reference);
    }
  });

  it('surrounds the pole for points all around it', () => {
    const lat = Float64Array.of(80, 75, 82, 78, 85), lon = Float64Array.of(0, 72, 144, -144, -72);
    const ring = ringOf(convexHull(degreesToUnitVectors(lat, lon)));
    expectValidHull(lat, lon, ring);
    const polygon = { type: 'Polygon' as const, coordinates: [[...ring, ring[0]].reverse().map((r) => [lon[r], lat[r]])] };
    expect(geoContains(polygon, [0, 90])).toBe(true);
  });

  it('leaves out repeated points and points on an edge, and works across the antimeridian', () => {
    const lat = Float64Array.of(-10, -10, 10, 10, 0, -10, 0, 0);
    const lon = Float64Array.of(170, -170, -170, 170, 180, 170, -180, 175);
    const ring = Array.from(ringOf(convexHull(degreesToUnitVectors(lat, lon))));
    expect(ring.length).toBe(4);
    expect(new Set(ring)).toEqual(new Set([0, 1, 2, 3]));
    expectValidHull(lat, lon, Uint32Array.from(ring));
  });

  it('exists for points that just fit in a hemisphere: within 89° of the north pole all around', () => {
    const { lat, lon } = capSample(9, 3000, 90, 0, 89);
    lat[0] = 1; lon[0] = 0; lat[1] = 1; lon[1] = 120; lat[2] = 1; lon[2] = -120;
    const ring = ringOf(convexHull(degreesToUnitVectors(lat, lon)));
    expectValidHull(lat, lon, ring);
  });

  it('does not exist for points reaching 1° south of the equator all around', () => {
    const { lat, lon } = capSample(10, 3000, 90, 0, 89);
    lat[0] = -1; lon[0] = 0; lat[1] = -1; lon[1] = 120; lat[2] = -1; lon[2] = -120;
    expect(convexHull(degreesToUnitVectors(lat, lon))).toEqual({ kind: 'none', reason: 'positions do not fit in an open hemisphere' });
  });

  it('does not exist for points spread over the whole globe, nor for points on a closed hemisphere’s rim', () => {
    const { lat, lon } = capSample(11, 10_000, 0, 0, 180);
    expect(convexHull(degreesToUnitVectors(lat, lon))).toEqual({ kind: 'none', reason: 'positions do not fit in an open hemisphere' });
    const rim = convexHull(degreesToUnitVectors(Float64Array.of(0, 0, 0, 45), Float64Array.of(0, 120, -120, 0)));
    expect(rim).toEqual({ kind: 'none', reason: 'positions do not fit in an open hemisphere' });
  });

  it('does not exist for fewer than three distinct places, counting ±180° and any longitude at a pole as one', () => {
    const reason = { kind: 'none', reason: 'fewer than three distinct positions' };
    expect(convexHull(degreesToUnitVectors(new Float64Array(0), new Float64Array(0)))).toEqual(reason);
    expect(convexHull(degreesToUnitVectors(Float64Array.of(5), Float64Array.of(5)))).toEqual(reason);
    expect(convexHull(degreesToUnitVectors(Float64Array.of(5, 5, 5, 5), Float64Array.of(-180, 180, -180, 180)))).toEqual(reason);
    expect(convexHull(degreesToUnitVectors(Float64Array.of(90, 90, 20, 90), Float64Array.of(0, 45, 3, -170)))).toEqual(reason);
  });

  it('does not exist for points on one great circle: the equator, a meridian, or a tilted circle', () => {
    const reason = { kind: 'none', reason: 'all positions on one great circle' };
    expect(convexHull(degreesToUnitVectors(Float64Array.of(0, 0, 0, 0), Float64Array.of(10, 20, 35, 50)))).toEqual(reason);
    expect(convexHull(degreesToUnitVectors(Float64Array.of(-30, 10, 60, 89), Float64Array.of(40, 40, 40, 40)))).toEqual(reason);
    // Points of the great circle through (0°, 0°) and (45°N, 90°E): lat = atan(sin λ), any λ.
    const lon = Float64Array.of(-60, -10, 0, 33, 80);
    const lat = lon.map((l) => Math.atan(Math.sin(l * RAD)) / RAD);
    expect(convexHull(degreesToUnitVectors(lat, lon))).toEqual(reason);
  });
});
