import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import geodesic from 'geographiclib-geodesic';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { minimumSpanningTree } from '../../src/sphere/minimum-spanning-tree';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';

// Distances from GeographicLib on a sphere of the same radius (flattening 0), in km.
const sphere = new geodesic.Geodesic.Geodesic(EARTH_RADIUS_KM * 1000, 0);
const km = (lat: Float64Array, lon: Float64Array, i: number, j: number) =>
  sphere.Inverse(lat[i], lon[i], lat[j], lon[j], geodesic.Geodesic.DISTANCE).s12! / 1000;

// Reference: Prim's algorithm (Prim 1957, Bell Syst. Tech. J. 36) on the complete graph, O(n²),
// with GeographicLib distances: no triangulation, no sorting, nothing shared with the code tested.
function primLengthKm(lat: Float64Array, lon: Float64Array): number {
  const n = lat.length;
  if (n < 2) return 0;
  const inTree = new Uint8Array(n);
  const best = new Float64Array(n).fill(Infinity);
  best[0] = 0;
  let total = 0;
  for (let step = 0; step < n; step++) {
    let u = -1;
    for (let i = 0; i < n; i++) if (!inTree[i] && (u < 0 || best[i] < best[u])) u = i;
    inTree[u] = 1;
    total += best[u];
    for (let v = 0; v < n; v++) if (!inTree[v]) best[v] = Math.min(best[v], km(lat, lon, u, v));
  }
  return total;
}

/** The edges form a spanning tree of all rows, and their GeographicLib lengths add up to lengthKm. */
function expectSpanningTree(lat: Float64Array, lon: Float64Array, tree: { lengthKm: number; edges: Uint32Array }): void {
  const n = lat.length;
  expect(tree.edges.length).toBe(2 * Math.max(0, n - 1));
  const parent = Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x])));
  let sum = 0;
  for (let k = 0; k < tree.edges.length; k += 2) {
    const a = find(tree.edges[k]), b = find(tree.edges[k + 1]);
    expect(a).not.toBe(b); // no cycle
    parent[a] = b;
    sum += km(lat, lon, tree.edges[k], tree.edges[k + 1]);
  }
  expect(Math.abs(sum - tree.lengthKm)).toBeLessThanOrEqual(1e-9 * sum + 1e-9);
}

function expectMinimal(lat: Float64Array, lon: Float64Array): void {
  const tree = minimumSpanningTree(degreesToUnitVectors(lat, lon));
  expectSpanningTree(lat, lon, tree);
  const reference = primLengthKm(lat, lon);
  expect(Math.abs(tree.lengthKm - reference)).toBeLessThanOrEqual(1e-9 * reference + 1e-9);
}

const seeded = (seed: number) => {
  let s = seed >>> 0 || 1;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
};

/** Ways of drawing n positions that stress a triangulation. */
const layouts: Record<string, (next: () => number, i: number) => [number, number]> = {
  'spread over the globe': (next) => [Math.asin(2 * next() - 1) / (Math.PI / 180), 360 * next() - 180],
  'with many repeats': (next) => [10 * Math.floor(4 * next()), 20 * Math.floor(5 * next()) - 180],
  'on the equator, spanning more than half of it': (next) => [0, Math.round(3600 * next()) / 10 - 180],
  'on a tilted great circle': (next) => {
    const l = 360 * next() - 180;
    return [Math.atan(0.7 * Math.sin(l * (Math.PI / 180))) / (Math.PI / 180), l];
  },
  'near and on the poles': (next, i) => [(i % 2 ? 1 : -1) * (i % 5 === 0 ? 90 : 89.9 + 0.1 * next()), 360 * next() - 180],
  'across the antimeridian': (next) => [10 * next() - 5, next() < 0.5 ? 179 + next() : -180 + next()],
  'on a 15° grid (many points on one circle)': (next) => [15 * Math.floor(13 * next()) - 90, 15 * Math.floor(24 * next()) - 180],
  'in a few tight clusters': (next) => [20 * Math.floor(3 * next()) + 1e-6 * next(), 50 * Math.floor(3 * next()) + 1e-6 * next()],
};

describe('minimum spanning tree', () => {
  for (const [name, draw] of Object.entries(layouts)) {
    it(`is as short as Prim’s tree for random positions ${name} (property)`, () => {
      fc.assert(fc.property(fc.integer(), fc.integer({ min: 0, max: 300 }), (seed, n) => {
        const next = seeded(seed);
        const lat = new Float64Array(n), lon = new Float64Array(n);
        for (let i = 0; i < n; i++) [lat[i], lon[i]] = draw(next, i);
        expectMinimal(lat, lon);
      }), { numRuns: 12, seed: 71 });
    });
  }

  it('handles no position, one position, and two positions (antipodal ones too)', () => {
    expect(minimumSpanningTree(degreesToUnitVectors(new Float64Array(0), new Float64Array(0)))).toEqual({ lengthKm: 0, edges: new Uint32Array(0) });
    expect(minimumSpanningTree(degreesToUnitVectors(Float64Array.of(3), Float64Array.of(4)))).toEqual({ lengthKm: 0, edges: new Uint32Array(0) });
    const two = minimumSpanningTree(degreesToUnitVectors(Float64Array.of(0, 0), Float64Array.of(0, 90)));
    expect(Array.from(two.edges)).toEqual([0, 1]);
    expect(two.lengthKm).toBeCloseTo((Math.PI / 2) * EARTH_RADIUS_KM, 9);
    expect(minimumSpanningTree(degreesToUnitVectors(Float64Array.of(30, -30), Float64Array.of(10, -170))).lengthKm).toBeCloseTo(Math.PI * EARTH_RADIUS_KM, 9);
  });

  it('joins repeated places by zero-length edges, ±180° and any longitude at a pole being one place', () => {
    const lat = Float64Array.of(5, 5, 90, 90, 5);
    const lon = Float64Array.of(-180, 180, 0, 77, -180);
    const tree = minimumSpanningTree(degreesToUnitVectors(lat, lon));
    expectSpanningTree(lat, lon, tree);
    expect(tree.lengthKm).toBeCloseTo(85 * (Math.PI / 180) * EARTH_RADIUS_KM, 9);
  });

  it('stays minimal when places differ only in the last bits of their degrees', () => {
    const lat = new Float64Array(60), lon = new Float64Array(60);
    const next = seeded(72);
    for (let i = 0; i < 60; i++) {
      const spread = i % 3 === 0;
      lat[i] = spread ? 80 * next() - 40 : 45 + i * 7.105427357601002e-15; // steps of one ulp at 45°
      lon[i] = spread ? 360 * next() - 180 : 7 - (i % 4) * 8.881784197001252e-16;
    }
    expectMinimal(lat, lon);
  });
});
