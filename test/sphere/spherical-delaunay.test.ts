import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { incircle, orient2d } from 'robust-predicates';
import { geoDelaunay } from 'd3-geo-voronoi';
import { planarDelaunay } from '../../src/sphere/planar-delaunay';
import { sphericalDelaunay } from '../../src/sphere/spherical-delaunay';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';

const next = (e: number) => (e % 3 === 2 ? e - 2 : e + 1);

/**
 * Checks a planar triangulation against the definition, with exact predicates from
 * robust-predicates (Shewchuk's): twins agree, finite triangles are properly oriented, no point
 * lies strictly inside the circumcircle of the triangle across any edge (Delaunay's empty-circle
 * criterion, which checked on every edge makes the whole triangulation Delaunay — Delaunay's
 * lemma), every point is a vertex unless it repeats a vertex's coordinates, and the closed
 * surface has 2V − 4 triangles (Euler).
 */
function expectDelaunay(xy: Float64Array): void {
  const n = xy.length / 2, inf = n;
  const d = planarDelaunay(xy);
  const { triangles: t, halfedges: h } = d;
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
  for (let k = 0; k < d.coincident.length; k += 2) {
    const [c, v] = [d.coincident[k], d.coincident[k + 1]];
    if (!seen.has(v) || xy[2 * v] !== xy[2 * c] || xy[2 * v + 1] !== xy[2 * c + 1]) problems.push(`point ${c} left out for ${v}`);
  }
  if (seen.size - 1 + d.coincident.length / 2 !== n) problems.push('points missing');
  if (d.length / 3 !== 2 * seen.size - 4) problems.push('wrong number of triangles');
  expect(problems).toEqual([]);
}

/** Every edge of the spherical triangulation once, as "a-b" with a < b. */
function sphericalEdges(xyz: Float64Array): string[] {
  const d = sphericalDelaunay(xyz);
  const key = (u: number, v: number) => {
    const [a, b] = [d.vertices[u], d.vertices[v]];
    return `${Math.min(a, b)}-${Math.max(a, b)}`;
  };
  const edges: string[] = [];
  for (let e = 0; e < d.length; e++) if (d.halfedges[e] > e) edges.push(key(d.triangles[e], d.triangles[next(e)]));
  for (let k = 0; k < d.edges.length; k += 2) edges.push(key(d.edges[k], d.edges[k + 1]));
  return edges;
}

const seeded = (seed: number) => {
  let s = seed >>> 0 || 1;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
};

// Each draws point i (inserted i-th); the random ones come in random order.
const layouts: Record<string, (r: () => number, i: number) => [number, number]> = {
  'in a few tight clusters': (r) => [Math.floor(3 * r()) + 1e-8 * r(), Math.floor(3 * r()) + 1e-8 * r()],
  'on a small integer grid, with repeats': (r) => [Math.floor(5 * r()), Math.floor(5 * r())],
  'mostly on one line': (r) => { const x = r(); return [x, 0.3 * x + (r() < 0.1 ? r() : 0)]; },
  'on one circle': (r) => { const a = 2 * Math.PI * r(); return [Math.cos(a), Math.sin(a)]; },
  'over eight orders of magnitude': (r) => [(r() - 0.5) * 10 ** (8 * r() - 4), (r() - 0.5) * 10 ** (8 * r() - 4)],
  // Every quadruple of a square cocircular, and each point inserted next to the last one.
  'on a square grid, inserted row by row': (_, i) => [i % 9, Math.floor(i / 9)],
  'on a square grid, inserted in a spiral from the middle': (_, i) => {
    const a = Math.sqrt(i) * 2.4, rho = Math.sqrt(i);
    return [Math.round(rho * Math.cos(a)), Math.round(rho * Math.sin(a))];
  },
};

describe('planar Delaunay triangulation', () => {
  for (const [name, draw] of Object.entries(layouts)) {
    it(`meets the empty-circle criterion exactly for points ${name} (property)`, () => {
      fc.assert(fc.property(fc.integer(), fc.integer({ min: 3, max: 300 }), (seed, n) => {
        const r = seeded(seed);
        const xy = new Float64Array(2 * n);
        for (let i = 0; i < n; i++) [xy[2 * i], xy[2 * i + 1]] = draw(r, i);
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
      const ours = sphericalEdges(degreesToUnitVectors(lat, lon));
      const key = (a: number, b: number) => `${Math.min(a, b)}-${Math.max(a, b)}`;
      const oursSet = new Set(ours);
      expect(oursSet.size).toBe(ours.length); // each edge once
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

  it('number every distinct vector once as a vertex and report each repeat against a vertex with the same vector (property)', () => {
    fc.assert(fc.property(fc.integer(), fc.integer({ min: 0, max: 200 }), fc.integer({ min: 1, max: 8 }), (seed, n, places) => {
      const r = seeded(seed);
      // n vectors drawn from a few places (lat/lon multiples of 10°), so most repeat.
      const lat = Float64Array.from({ length: n }, () => 10 * Math.floor(places * r()) - 40);
      const lon = Float64Array.from({ length: n }, () => 30 * Math.floor(places * r()) - 90);
      const xyz = degreesToUnitVectors(lat, lon);
      const d = sphericalDelaunay(xyz);
      const vector = (i: number) => Array.from(xyz.subarray(3 * i, 3 * i + 3));
      const used = new Set<number>(); // vertices in some triangle or edge
      for (let e = 0; e < d.length; e++) used.add(d.triangles[e]);
      for (const v of d.edges) used.add(v);
      const seen = new Map<number, number>(); // vector index → times listed
      const list = (i: number) => seen.set(i, (seen.get(i) ?? 0) + 1);
      for (let v = 0; v < d.vertices.length; v++) {
        expect(Array.from(d.points.subarray(3 * v, 3 * v + 3))).toEqual(vector(d.vertices[v]));
        if (used.has(v) || d.vertices.length === 1) list(d.vertices[v]);
      }
      for (let k = 0; k < d.repeats.length; k += 2) {
        const [i, v] = [d.repeats[k], d.repeats[k + 1]];
        expect(vector(i)).toEqual(vector(d.vertices[v]));
        expect(used.has(v) || d.vertices.length === 1).toBe(true);
        list(i);
      }
      expect([...seen.keys()].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
      expect([...seen.values()].every((times) => times === 1)).toBe(true);
      const distinct = new Set(Array.from({ length: n }, (_, i) => vector(i).join())).size;
      expect(n - d.repeats.length / 2).toBe(distinct);
    }), { numRuns: 150, seed: 82 });
  });

  it('join points on one great circle through the pivot in order around it', () => {
    const lon = Float64Array.of(0, 30, 100, 170, -120, -60);
    const set = new Set(sphericalEdges(degreesToUnitVectors(new Float64Array(6), lon)));
    for (const e of ['0-1', '1-2', '2-3', '3-4', '4-5', '0-5']) expect(set.has(e)).toBe(true);
  });
});
