import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { geoArea, geoContains } from 'd3-geo';
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { parseGridName } from '../../src/grid';
import { AREA_KINDS, availableCells, prepareGapGrid, prepareSphericalPolygons, pointsInSphericalPolygons } from '../../src/gaps';

const box = (w: number, s: number, e: number, n: number): Position[] => [[w, s], [e, s], [e, n], [w, n], [w, s]];
const reversed = (ring: Position[]) => [...ring].reverse();
const capRing = (lat: number, step: number): Position[] => {
  const ring: Position[] = [];
  for (let lon = -180; lon < 180; lon += step) ring.push([lon, lat]);
  ring.push([...ring[0]]);
  return ring;
};

// Edges are kept off the test points' meridians and parallels (HEALPix centres lie on meridians
// at multiples of 45°/nside/2 and on the equator), so no point lies on an edge.
const AREAS: Array<[string, Polygon | MultiPolygon]> = [
  ['a box written anticlockwise', { type: 'Polygon', coordinates: [box(10.3, 10.3, 30.3, 25.3)] }],
  ['the same box written clockwise', { type: 'Polygon', coordinates: [reversed(box(10.3, 10.3, 30.3, 25.3))] }],
  ['a box with a hole', { type: 'Polygon', coordinates: [box(-60.3, -30.3, -0.3, 20.3), reversed(box(-40.3, -10.3, -20.3, 5.3))] }],
  ['a box over the antimeridian', { type: 'Polygon', coordinates: [[[170.3, -20.3], [-170.3, -20.3], [-170.3, 1.3], [170.3, 1.3], [170.3, -20.3]]] }],
  ['a cap round the North Pole', { type: 'Polygon', coordinates: [capRing(60.3, 30)] }],
  ['a cap round the South Pole, written clockwise', { type: 'Polygon', coordinates: [reversed(capRing(-50.3, 20))] }],
  [
    'a ring through the North Pole with a pole line',
    { type: 'Polygon', coordinates: [[[0.3, 70.3], [90.3, 70.3], [90.3, 90], [0.3, 90], [0.3, 70.3]]] },
  ],
  ['two boxes', { type: 'MultiPolygon', coordinates: [[box(100.3, -60.3, 140.3, -40.3)], [box(-120.3, 40.3, -100.3, 50.3)]] }],
  ['a triangle whose long edges cross the antimeridian', { type: 'Polygon', coordinates: [[[-150.3, 20.3], [150.3, 25.7], [-150.3, 35.3], [-150.3, 20.3]]] }],
];

/**
 * The same geometry as d3-geo reads it: d3 takes the side on a ring's right as its inside
 * (STACK.md), while we take each ring's smaller side. So each exterior is turned to have its
 * smaller side on its right (its d3 area below 2π) and each hole the other way.
 */
function forD3(geometry: Polygon | MultiPolygon): MultiPolygon {
  const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  return {
    type: 'MultiPolygon',
    coordinates: polygons.map((rings) => rings.map((ring, r) => {
      const small = geoArea({ type: 'Polygon', coordinates: [ring] }) <= 2 * Math.PI;
      return small === (r === 0) ? ring : reversed(ring);
    })),
  };
}

describe('points in polygons on the sphere', () => {
  const g = prepareGapGrid(parseGridName('healpix:32'));
  // Seeded points spread over the sphere as well as the cell centres.
  let s = 7;
  const next = () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  const lat = new Float64Array(4000).map(() => (Math.asin(2 * next() - 1) * 180) / Math.PI);
  const lon = new Float64Array(4000).map(() => 360 * next() - 180);

  it.each(AREAS)('agree with d3-geo geoContains for %s', (_what, geometry) => {
    const prepared = prepareSphericalPolygons([geometry], 'area');
    const d3 = forD3(geometry);
    for (const [la, lo] of [[g.centreLat, g.centreLon], [lat, lon]]) {
      const ours = pointsInSphericalPolygons(prepared, la, lo, new Uint8Array(la.length));
      const wrong: string[] = [];
      let inside = 0;
      for (let i = 0; i < la.length; i++) {
        const theirs = geoContains(d3, [lo[i], la[i]]);
        if ((ours[i] === 1) !== theirs) wrong.push(`(${la[i]}, ${lo[i]}): ours ${ours[i]}, d3 ${theirs}`);
        inside += ours[i];
      }
      expect(wrong).toEqual([]);
      expect(inside).toBeGreaterThan(0);
    }
  });

  it('agree with d3-geo geoContains for random quadrilaterals anywhere, written either way', () => {
    const angle = fc.double({ min: 0, max: 2 * Math.PI, noNaN: true });
    fc.assert(fc.property(
      fc.double({ min: -90, max: 90, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: 1, max: 70, noNaN: true }),
      fc.tuple(angle, angle, angle, angle), fc.boolean(),
      (clat, clon, radius, turns, clockwise) => {
        // Four vertices at `radius` from a centre, in order of bearing: a simple ring.
        const bearings = [...turns].sort((a, b) => a - b);
        const c = (clat * Math.PI) / 180, r = (radius * Math.PI) / 180;
        const ring: Position[] = bearings.map((b) => {
          const lat = Math.asin(Math.sin(c) * Math.cos(r) + Math.cos(c) * Math.sin(r) * Math.cos(b));
          const lon = clon + (Math.atan2(Math.sin(b) * Math.sin(r) * Math.cos(c), Math.cos(r) - Math.sin(c) * Math.sin(lat)) * 180) / Math.PI;
          return [((lon + 540) % 360) - 180, (lat * 180) / Math.PI];
        });
        ring.push([...ring[0]]);
        const geometry: Polygon = { type: 'Polygon', coordinates: [clockwise ? ring : reversed(ring)] };
        const ours = pointsInSphericalPolygons(prepareSphericalPolygons([geometry], 'area'), lat, lon, new Uint8Array(lat.length));
        const d3 = forD3(geometry);
        for (let i = 0; i < lat.length; i += 4) expect([i, ours[i] === 1]).toEqual([i, geoContains(d3, [lon[i], lat[i]])]);
      },
    ), { numRuns: 60 });
  });

  it('read a ring written either way as the same area', () => {
    const a = pointsInSphericalPolygons(prepareSphericalPolygons([AREAS[0][1]], 'a'), g.centreLat, g.centreLon, new Uint8Array(g.grid.cellCount));
    const b = pointsInSphericalPolygons(prepareSphericalPolygons([AREAS[1][1]], 'b'), g.centreLat, g.centreLon, new Uint8Array(g.grid.cellCount));
    expect(a).toEqual(b);
  });

  it('refuse an unclosed ring and a ring through both poles, naming the ring', () => {
    const open: Polygon = { type: 'Polygon', coordinates: [[[0, 0], [10, 0], [10, 10], [0, 10]]] };
    expect(() => prepareSphericalPolygons([open], 'land.geojson')).toThrow(
      'land.geojson, geometry 1, ring 1: expected a closed ring of at least 4 positions, the last equal to the first.',
    );
    const lune: Polygon = { type: 'Polygon', coordinates: [[[0, -90], [0, 0], [0, 90], [90, 0], [0, -90]]] };
    expect(() => prepareSphericalPolygons([lune], 'land.geojson')).toThrow('land.geojson, geometry 1, ring 1: the ring passes through both poles');
  });
});

describe('available cells', () => {
  const g = prepareGapGrid(parseGridName('bands:10'));
  const occupied = { start: Uint32Array.of(0, 2, 4), cell: Uint32Array.of(3, 9, 9, 40) };

  it('are every cell for the whole sphere', () => {
    expect(availableCells(g, { kind: AREA_KINDS.all }, occupied).every((v) => v === 1)).toBe(true);
  });

  it('are the cells occupied in any slice for `occupied`', () => {
    const mask = availableCells(g, { kind: AREA_KINDS.occupied }, occupied);
    expect([...mask.keys()].filter((c) => mask[c] === 1)).toEqual([3, 9, 40]);
  });

  it('are the cells whose centre lies inside the polygons (d3-geo geoContains) for an area', () => {
    const geometry = AREAS[2][1];
    const mask = availableCells(g, { kind: AREA_KINDS.polygons, polygons: prepareSphericalPolygons([geometry], 'area') }, occupied);
    const d3 = forD3(geometry);
    for (let c = 0; c < g.grid.cellCount; c++) expect(mask[c] === 1).toBe(geoContains(d3, [g.centreLon[c], g.centreLat[c]]));
    expect(mask.reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
  });
});
