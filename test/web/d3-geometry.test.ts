// Rings of the view handed to d3-geo, checked with d3-geo itself and @turf/turf as references:
// - a HEALPix cell encloses 4π/(12·nside²) sr (Górski et al. 2005), measured by d3 geoArea;
//   d3 reads edges as great circles while the outline's vertices lie on the curved boundary, so
//   the chord polygon differs by O(step²) (common numerical practice): a fine step is used;
// - a lon/lat box encloses R²·Δλ·(sin φN − sin φS) (area of a spherical "rectangle" between two
//   parallels and two meridians, e.g. Snyder 1987, Map Projections — A Working Manual, from memory),
//   and a polar cap south of φ encloses 2π(1 + sin φ) sr (cap area 2π(1 − cos θ), θ = 90° + φ);
// - ring order: turf booleanClockwise (planar, lon/lat), RFC 7946 §3.1.6 exteriors counter-clockwise.
import { booleanClockwise, lineString } from '@turf/turf';
import { geoArea } from 'd3-geo';
import type { FeatureCollection, Polygon, Position } from 'geojson';
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { cellPolygon, polygonEdges, rewindForD3, slicePaths } from '../../web/equal-area/d3-geometry';
import type { CellShapes } from '../../web/protocol';
import { boxRing, capRing, CAP_EDGE_LAT, smallView } from './small-analysis-view';

const RADIANS = Math.PI / 180;

/** Cell outlines of the grid packed as the worker packs them (Float32 [lon, lat] pairs). */
function packShapes(grid: HealpixGrid, cells: readonly number[], stepDeg: number): CellShapes {
  const ringStart = [0], coords: number[] = [];
  for (const cell of cells) {
    for (const [lon, lat] of grid.cellRing(cell, stepDeg)) coords.push(lon, lat);
    ringStart.push(coords.length / 2);
  }
  return { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: new Float32Array(2 * cells.length) };
}

function polygonOf(collection: FeatureCollection, feature: number): Polygon {
  const geometry = collection.features[feature].geometry;
  if (geometry.type !== 'Polygon') throw new Error(`feature ${feature} is a ${geometry.type}`);
  return geometry;
}

describe('cellPolygon', () => {
  it('gives every HEALPix nside-8 cell, reversed for d3, the area 4π/768 sr by d3 geoArea', () => {
    const grid = new HealpixGrid(8);
    const cells = Array.from({ length: grid.cellCount }, (_, c) => c);
    const shapes = packShapes(grid, cells, 0.05);
    for (let shape = 0; shape < cells.length; shape++) {
      const area = geoArea(cellPolygon(shapes, shape));
      // Float32 vertices (about 1e-5° near ±180°) and 0.05° chords leave well under 1e-4.
      expect(Math.abs(area / grid.cellAreaSr - 1), `cell ${cells[shape]}`).toBeLessThan(1e-4);
    }
  });

  it('keeps the d3 area within 1% of the true cell area at the 2° outline step the worker uses', () => {
    const grid = new HealpixGrid(8);
    const cells = [0, 63, 64 * 5 + 20, 64 * 8, 767];
    const shapes = packShapes(grid, cells, 2);
    cells.forEach((cell, shape) => expect(Math.abs(geoArea(cellPolygon(shapes, shape)) / grid.cellAreaSr - 1), `cell ${cell}`).toBeLessThan(0.01));
  });

  it('returns the ring in clockwise order by turf, the reverse of the grid\'s RFC 7946 ring', () => {
    const grid = new HealpixGrid(8);
    const shapes = packShapes(grid, [64 * 5 + 20], 1);
    const ring = cellPolygon(shapes, 0).coordinates[0];
    expect(booleanClockwise(lineString(ring))).toBe(true);
    expect(booleanClockwise(lineString(grid.cellRing(64 * 5 + 20, 1)))).toBe(false);
  });
});

describe('rewindForD3', () => {
  const box: Position[] = boxRing(-20, 25, 30, 55);
  const source: FeatureCollection = {
    type: 'FeatureCollection',
    features: [
      { type: 'Feature', properties: { plate_id: 1 }, geometry: { type: 'Polygon', coordinates: [box] } },
      { type: 'Feature', properties: { plate_id: 2 }, geometry: { type: 'Polygon', coordinates: [capRing()] } },
    ],
  };

  it('makes a counter-clockwise box enclose R²·Δλ·(sin φN − sin φS) for d3, not the rest of the globe', () => {
    const expected = 50 * RADIANS * (Math.sin(55 * RADIANS) - Math.sin(25 * RADIANS));
    expect(geoArea(polygonOf(source, 0))).toBeGreaterThan(2 * Math.PI); // what d3 makes of the RFC 7946 ring
    // 1° great-circle chords along the parallels: the two bulges nearly cancel; 0.5% is ample.
    expect(Math.abs(geoArea(polygonOf(rewindForD3(source), 0)) / expected - 1)).toBeLessThan(0.005);
  });

  it('makes a ring around the South Pole enclose the polar cap, 2π(1 + sin φ) sr', () => {
    const expected = 2 * Math.PI * (1 + Math.sin(CAP_EDGE_LAT * RADIANS));
    expect(Math.abs(geoArea(polygonOf(rewindForD3(source), 1)) / expected - 1)).toBeLessThan(0.005);
  });

  it('reverses holes too, and leaves the input collection untouched', () => {
    const hole = boxRing(0, 35, 10, 45).slice().reverse(); // RFC 7946: holes clockwise
    const withHole: FeatureCollection = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: [[box, hole]] } }] };
    const before = JSON.stringify(withHole);
    const rewound = rewindForD3(withHole).features[0].geometry;
    expect(JSON.stringify(withHole)).toBe(before);
    const outer = 50 * RADIANS * (Math.sin(55 * RADIANS) - Math.sin(25 * RADIANS));
    const inner = 10 * RADIANS * (Math.sin(45 * RADIANS) - Math.sin(35 * RADIANS));
    expect(Math.abs(geoArea(rewound) / (outer - inner) - 1)).toBeLessThan(0.005);
  });
});

describe('polygonEdges', () => {
  it('outlines a cap cut at the antimeridian and closed along the pole line by its edge parallel alone', () => {
    const cap: FeatureCollection = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [capRing()] } }] };
    const lines = polygonEdges(cap).coordinates;
    expect(lines.length).toBe(1);
    expect(lines[0].every(([, lat]) => lat === CAP_EDGE_LAT)).toBe(true);
    expect(lines[0][0]).toEqual([180, CAP_EDGE_LAT]);
    expect(lines[0].at(-1)).toEqual([-180, CAP_EDGE_LAT]);
  });

  it('keeps every edge of a ring away from the cut lines, holes included', () => {
    const box = boxRing(-20, 25, 30, 55), hole = boxRing(0, 35, 10, 45).slice().reverse();
    const collection: FeatureCollection = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: [[box, hole]] } }] };
    expect(polygonEdges(collection).coordinates).toEqual([box, hole]);
  });
});

describe('slicePaths', () => {
  it('returns each path of a slice with its vertices in order', () => {
    const { spanningTrees: trees } = smallView();
    const lines = slicePaths(trees, 1).coordinates;
    expect(lines.length).toBe(trees.sliceStart[2] - trees.sliceStart[1]);
    const p = trees.sliceStart[1] + 5;
    const v = trees.pathStart[p];
    expect(lines[5][0]).toEqual([trees.coords[2 * v], trees.coords[2 * v + 1]]);
    expect(lines[5].length).toBe(trees.pathStart[p + 1] - v);
  });

  it('returns no lines for a slice without a hull', () => {
    const view = smallView();
    expect(view.slices[3].hullNote).toBeDefined();
    expect(slicePaths(view.hulls, 3).coordinates).toEqual([]);
    expect(slicePaths(view.hulls, 0).coordinates.length).toBe(1);
  });
});
