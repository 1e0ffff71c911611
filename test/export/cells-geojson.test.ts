import { describe, expect, it } from 'vitest';
import { geoArea } from 'd3-geo';
import { booleanClockwise } from '@turf/turf';
import type { Feature, FeatureCollection, MultiPolygon, Polygon, Position } from 'geojson';
import { cellsGeoJson } from '../../src/export/cells-geojson';
import type { CellTallies } from '../../src/footprint/cell-tallies';
import { parseGridName } from '../../src/grid';

/** Every cell of the grid, occupied once in slice 0. */
function everyCell(cellCount: number): CellTallies {
  const cell = Uint32Array.from({ length: cellCount }, (_, i) => i);
  const ones = new Uint32Array(cellCount).fill(1);
  return { count: cellCount, slice: new Uint32Array(cellCount), cell, occurrences: ones, collections: ones, taxa: ones };
}

const polygonsOf = (f: Feature<Polygon | MultiPolygon>): Position[][][] =>
  f.geometry.type === 'Polygon' ? [f.geometry.coordinates] : f.geometry.coordinates;

describe.each(['healpix:4', 'bands:15'])('cells.geojson for every cell of %s', (name) => {
  const grid = parseGridName(name);
  const text = Buffer.concat([...cellsGeoJson(everyCell(grid.cellCount), grid)]).toString('utf8');
  const collection = JSON.parse(text) as FeatureCollection<Polygon | MultiPolygon>;

  it('is a FeatureCollection with one feature per cell and the cells.csv properties', () => {
    expect(collection.type).toBe('FeatureCollection');
    expect(collection.features).toHaveLength(grid.cellCount);
    expect(Object.keys(collection.features[0].properties ?? {})).toEqual(['slice', 'grid', 'cell', 'cell_lat', 'cell_lon', 'occurrences', 'collections', 'taxa']);
  });

  it('keeps every longitude within ±180°, splitting cells at the antimeridian (RFC 7946 §3.1.9)', () => {
    const split = collection.features.filter((f) => f.geometry.type === 'MultiPolygon');
    // HEALPix cells straddle 180° (their centres lie on it in some rings); band columns start at -180°.
    expect(split.length > 0).toBe(name.startsWith('healpix'));
    for (const f of collection.features) for (const polygon of polygonsOf(f)) for (const [lon] of polygon[0]) expect(Math.abs(lon)).toBeLessThanOrEqual(180);
  });

  it('writes closed counter-clockwise exterior rings (RFC 7946 §3.1.6; checked with turf)', () => {
    for (const f of collection.features) {
      for (const [ring] of polygonsOf(f)) {
        expect(ring[0]).toEqual(ring[ring.length - 1]);
        expect(booleanClockwise(ring)).toBe(false);
      }
    }
  });

  it('gives every cell, split or not, the grid cell area (d3-geo geoArea on rewound rings)', () => {
    // d3-geo reads a clockwise ring as the small side (STACK.md), so rings are reversed for it.
    // Split parts are joined by straight lon/lat cuts that d3 draws as great circles along a
    // meridian — the same line — so the parts add up to the whole cell.
    for (const f of collection.features) {
      const area = polygonsOf(f).reduce((sum, [ring]) => sum + geoArea({ type: 'Polygon', coordinates: [[...ring].reverse()] }), 0);
      expect(Math.abs(area / grid.cellAreaSr - 1)).toBeLessThan(2e-3);
    }
  });
});
