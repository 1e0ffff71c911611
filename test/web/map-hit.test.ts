// Hover hit-testing: the entry found under a map point is checked against d3-geo geoContains on
// the cell's outline (d3 as the independent reference for "this position is inside this cell"),
// and points off the drawn globe find nothing.
import { geoContains } from 'd3-geo';
import fc from 'fast-check';
import type { Polygon } from 'geojson';
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { CellLookup } from '../../web/equal-area/cell-lookup';
import { fitFrame } from '../../web/equal-area/map-frame';
import { entryAtMapPoint, mapPointToLonLatInto } from '../../web/equal-area/map-hit';
import { EQUAL_AREA_PROJECTIONS, referenceProjection } from '../../web/equal-area/map-projection';
import { d3Polygon } from '../grid/d3-rings';
import { framePoint } from './frame-point';
import { smallView } from './small-analysis-view';

const view = smallView();
const lookup = new CellLookup(view.gridName, view.cells);
const grid = new HealpixGrid(8);

/** Whether moving the position by NUDGE_DEG in some direction changes what d3 says about it. */
const NUDGE_DEG = 1e-5;
function nearEdge(outline: Polygon, lon: number, lat: number, inside: boolean): boolean {
  return [[NUDGE_DEG, 0], [-NUDGE_DEG, 0], [0, NUDGE_DEG], [0, -NUDGE_DEG]].some(([dx, dy]) => geoContains(outline, [lon + dx, lat + dy]) !== inside);
}

/** Box point of a position on a map fitted to 900 × 500. */
function mapPoint(kind: (typeof EQUAL_AREA_PROJECTIONS)[number], lon: number, lat: number): { x: number; y: number; frame: ReturnType<typeof fitFrame> } {
  const reference = referenceProjection(kind);
  const frame = fitFrame(reference, 6, 6, 894, 494);
  const [xr, yr] = reference.projection([lon, lat])!;
  const [x, y] = framePoint(frame, xr, yr);
  return { x, y, frame };
}

describe('CellLookup', () => {
  // Outlines at a 0.02° step: d3's chords then lie within ~1e-6° of the true cell edges (sagitta
  // L²/8 of a chord L), well inside the 1e-5° nudge of nearEdge.
  const outlines = Array.from(view.cells.cell, (cell) => d3Polygon(grid.cellRing(cell, 0.02)));

  it('finds, for positions anywhere, the entry whose cell outline d3 geoContains says holds them', () => {
    fc.assert(fc.property(
      fc.integer({ min: 0, max: view.slices.length - 1 }), fc.double({ min: -179.9, max: 179.9, noNaN: true }), fc.double({ min: -89.9, max: 89.9, noNaN: true }),
      (slice, lon, lat) => {
        const entry = lookup.entryAt(slice, lat, lon);
        const { sliceStart } = view.cells;
        for (let e = sliceStart[slice]; e < sliceStart[slice + 1]; e++) {
          const inside = geoContains(outlines[e], [lon, lat]);
          // A position on an edge belongs to one side by the grid's rule (east of it, see
          // healpix.ts) and to either by d3's; such positions are not the question here.
          if (inside === (entry === e) || nearEdge(outlines[e], lon, lat, inside)) continue;
          expect.fail(`(${lat}, ${lon}) in slice ${slice}: lookup gives entry ${entry}; d3 says it is ${inside ? 'inside' : 'outside'} entry ${e}`);
        }
      },
    ), { seed: 17, numRuns: 300, endOnFailure: true });
  });

  it('finds every occupied cell of a slice at its own centre, and no entry in another slice\'s cells', () => {
    const { sliceStart, shape } = view.cells;
    for (let e = sliceStart[2]; e < sliceStart[3]; e++) {
      const s = shape[e];
      expect(lookup.entryAt(2, view.shapes.centre[2 * s + 1], view.shapes.centre[2 * s])).toBe(e);
    }
    expect(lookup.entryAt(2, 89, 0)).toBe(-1); // no place of slice three near the North Pole
    expect(lookup.entryAt(9, 0, 0)).toBe(-1);
  });
});

describe('entryAtMapPoint', () => {
  it('finds the occupied cell drawn under a map point, on every projection', () => {
    const slice = 2; // places around the South Pole and in the southern mid-latitudes
    const e = view.cells.sliceStart[slice] + 3;
    const s = view.cells.shape[e];
    const lon = view.shapes.centre[2 * s], lat = view.shapes.centre[2 * s + 1];
    for (const kind of ['equal-earth', 'polar-south'] as const) {
      const { x, y, frame } = mapPoint(kind, lon, lat);
      expect(entryAtMapPoint(referenceProjection(kind), frame, lookup, slice, x, y, new Float64Array(2)), kind).toBe(e);
    }
  });

  it('finds nothing off the globe: beyond the Equal Earth outline, or on the hidden hemisphere of a polar map', () => {
    const reference = referenceProjection('equal-earth');
    const frame = fitFrame(reference, 6, 6, 894, 494);
    const out = new Float64Array(2);
    expect(mapPointToLonLatInto(reference, frame, 2, 2, out)).toBe(false); // corner outside the outline
    expect(mapPointToLonLatInto(reference, frame, 450, 250, out)).toBe(true);
    expect(out[0]).toBeCloseTo(0, 6);
    expect(out[1]).toBeCloseTo(0, 6);
    const north = referenceProjection('polar-north');
    const northFrame = fitFrame(north, 6, 6, 894, 494);
    // Just outside the hemisphere's circle (radius 244 about the centre 450, 250).
    expect(mapPointToLonLatInto(north, northFrame, 450 + 250, 250, out)).toBe(false);
    expect(mapPointToLonLatInto(north, northFrame, 450 + 238, 250, out)).toBe(true);
    expect(out[1]).toBeGreaterThan(0);
  });
});
