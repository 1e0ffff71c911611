import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { incircle, orient2d } from 'robust-predicates';
import { geoDelaunay } from 'd3-geo-voronoi';
import { planarDelaunay } from '../../src/sphere/planar-delaunay';
import { sphericalDelaunayEdges } from '../../src/sphere/spherical-delaunay';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';

const next = (e: number) => (e % 3 === 2 ? e - 2 : e + 1);

/**
 * Checks a planar triangulation against the definition, with exact predicates from
 * robust-predicates (Shewchuk's): twins agree, finite triangles are properly oriented, no point
 * lies strictly inside the circumcircle of the triangle across any edge (Delaunay's empty-circle
 * criterion, which checked on every edge makes the whole triangulation Delaunay — Delaunay's
 * lemma), every point is a vertex unless it repeats another's coordinates, and the closed
 * surface has 2V − 4 triangles (Euler).
 */
function expectDelaunay(xy: Float64Array): void {
  const n = xy.length / 2;
  const d = planarDelaunay(xy);
  const { triangles: t, halfedges: h, infinite: inf } = d;
  const P = (i: number): [number, number] => [xy[2 * i], xy[2 * i + 1]];
  const problems: string[] = [];
  const seen = new Set<number>();
  for (let e = 0; e < d.length; e++) {
    seen.add(t[e]);
    const f = h[e];
    if (h[f] !== e || t[f] !== t[next(e)] || t[next(f)] !== t[e]) problems.push(`half-edge ${e}: twin does not match`);
    const p = t[e], q = t[next(e)], r = t[next(next(e))], s = t[next(next(f))];
    if (p === inf || q === inf || r === inf) continue;
    if (orient2d(...P(p), ...P(q), ...P(r)) <= 0) problems.push(`triangle of half-edge ${e}: not properly oriented`);
    if (s !== inf && incircle(...P(p), ...P(q), ...P(r), ...P(s)) < 0) problems.push(`half-edge ${e}: point ${s} inside the circle`);
  }
  for (const c of d.coincident) {
    if (![...seen].some((v) => v !== inf && xy[2 * v] === xy[2 * c] && xy[2 * v + 1] === xy[2 * c + 1])) problems.push(`point ${c} left out`);
  }
  if (seen.size - 1 + d.coincident.length !== n) problems.push('points missing');
  if (d.length / 3 !== 2 * seen.size - 4) problems.push('wrong number of triangles');
  expect(problems).toEqual([]);
}

const seeded = (seed: number) => {
  let s = seed >>> 0 || 1;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
};

const layouts: Record<string, (r: () => number) => [number, number]> = {
  'in a few tight clusters': (r) => [Math.floor(3 * r()) + 1e-8 * r(), Math.floor(3 * r()) + 1e-8 * r()],
  'on a small integer grid, with repeats': (r) => [Math.floor(5 * r()), Math.floor(5 * r())],
  'mostly on one line': (r) => { const x = r(); return [x, 0.3 * x + (r() < 0.1 ? r() : 0)]; },
  'on one circle': (r) => { const a = 2 * Math.PI * r(); return [Math.cos(a), Math.sin(a)]; },
  'over eight orders of magnitude': (r) => [(r() - 0.5) * 10 ** (8 * r() - 4), (r() - 0.5) * 10 ** (8 * r() - 4)],
};

describe('planar Delaunay triangulation', () => {
  for (const [name, draw] of Object.entries(layouts)) {
    it(`meets the empty-circle criterion exactly for points ${name} (property)`, () => {
      fc.assert(fc.property(fc.integer(), fc.integer({ min: 3, max: 300 }), (seed, n) => {
        const r = seeded(seed);
        const xy = new Float64Array(2 * n);
        for (let i = 0; i < n; i++) [xy[2 * i], xy[2 * i + 1]] = draw(r);
        if (planarDelaunay(xy).length > 0) expectDelaunay(xy);
      }), { numRuns: 60, seed: 81 });
    });
  }

  it('reports no triangles when all points lie on one line', () => {
    expect(planarDelaunay(Float64Array.of(0, 0, 1, 1, 3, 3, 2, 2)).length).toBe(0);
  });
});

describe('spherical Delaunay edges', () => {
  // Reference: d3-geo-voronoi's geoDelaunay (Delaunator on a stereographic projection, a
  // different construction). For points all over the sphere the edge sets are the same; for
  // points within a hemisphere d3-geo-voronoi leaves out the triangles of the far side, whose
  // edges join vertices of the convex hull, so its edges are a subset of ours.
  it('are the same edges as d3-geo-voronoi’s for points spread over the sphere, and a superset within a hemisphere', () => {
    for (const [seed, spread] of [[1, 1], [2, 1], [3, 0.3], [4, 0.05]]) {
      const r = seeded(seed);
      const n = 250;
      const lat = Float64Array.from({ length: n }, () => Math.asin(spread * (2 * r() - 1)) * (180 / Math.PI));
      const lon = Float64Array.from({ length: n }, () => (360 * r() - 180) * spread);
      const ours = sphericalDelaunayEdges(degreesToUnitVectors(lat, lon));
      const key = (a: number, b: number) => `${Math.min(a, b)}-${Math.max(a, b)}`;
      const oursSet = new Set<string>();
      for (let k = 0; k < ours.length; k += 2) oursSet.add(key(ours[k], ours[k + 1]));
      expect(oursSet.size).toBe(ours.length / 2); // each edge once
      const d3 = geoDelaunay(Array.from(lat, (_, i): [number, number] => [lon[i], lat[i]]));
      const theirs = new Set(d3.edges.map(([a, b]) => key(a, b)));
      for (const e of theirs) expect(oursSet.has(e)).toBe(true);
      const hull = new Set(d3.hull);
      for (const e of oursSet) {
        if (theirs.has(e)) continue;
        expect(spread).toBeLessThan(1);
        const [a, b] = e.split('-').map(Number);
        expect(hull.has(a) && hull.has(b)).toBe(true);
      }
    }
  });

  it('join points on one great circle through the pivot in order around it', () => {
    const lon = Float64Array.of(0, 30, 100, 170, -120, -60);
    const edges = sphericalDelaunayEdges(degreesToUnitVectors(new Float64Array(6), lon));
    const set = new Set<string>();
    for (let k = 0; k < edges.length; k += 2) set.add(`${Math.min(edges[k], edges[k + 1])}-${Math.max(edges[k], edges[k + 1])}`);
    for (const e of ['0-1', '1-2', '2-3', '3-4', '4-5', '0-5']) expect(set.has(e)).toBe(true);
  });
});
