// Equal area and ring orientation of cell outlines, measured by general-purpose libraries:
// - d3-geo geoArea (spherical excess of the polygon, sr). d3 reads each edge as a great circle,
//   while our vertices lie on the true, curved cell boundary: the chord polygon differs from the
//   cell by O(step²) (common numerical practice; halving the step quarters the difference), so the
//   rings are densified finely enough for the 1e-6 tolerance. Rings are reversed for d3 (STACK.md).
// - @turf/turf booleanClockwise, for RFC 7946 (§3.1.6) exterior-ring order: counter-clockwise.
import { booleanClockwise, lineString } from '@turf/turf';
import { geoArea } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { HealpixGrid, LatitudeBandsGrid } from '../../src/grid';
import { d3Polygon } from './d3-rings';

const TOLERANCE = 1e-6;

describe('HEALPix cell outlines', () => {
  it('each enclose 4π/(12·nside²) sr by d3-geo geoArea, for nside 1 to 16', () => {
    for (const nside of [1, 2, 4, 8, 16]) {
      const grid = new HealpixGrid(nside);
      // At least 400 steps per edge (a cell is roughly √(4π/N) rad across), and no step over 0.05°
      // on the big cells, whose edges bend most.
      const step = Math.min(0.05, (Math.sqrt(grid.cellAreaSr) * (180 / Math.PI)) / 400);
      for (let cell = 0; cell < grid.cellCount; cell++) {
        const area = geoArea(d3Polygon(grid.cellRing(cell, step)));
        expect(Math.abs(area / grid.cellAreaSr - 1), `${grid.name} cell ${cell}`).toBeLessThan(TOLERANCE);
      }
    }
  });

  it('add up to the whole sphere, 4π sr, at nside 4', () => {
    const grid = new HealpixGrid(4);
    let total = 0;
    for (let cell = 0; cell < grid.cellCount; cell++) total += geoArea(d3Polygon(grid.cellRing(cell, 0.05)));
    expect(Math.abs(total / (4 * Math.PI) - 1)).toBeLessThan(TOLERANCE);
  });

  it('run counter-clockwise (RFC 7946) by turf booleanClockwise', () => {
    // Cells away from the antimeridian in the north cap, the belt and the south cap, plus the
    // cells that touch each pole (their pole corner is written twice, at two longitudes).
    const grid = new HealpixGrid(8);
    for (const cell of [5, 64 * 2 + 37, 64 * 5 + 20, 64 * 9 + 50, 63, 64 * 8]) {
      expect(booleanClockwise(lineString(grid.cellRing(cell, 0.5))), `cell ${cell}`).toBe(false);
    }
  });

  it('never step further than the requested arc', () => {
    const grid = new HealpixGrid(2);
    for (let cell = 0; cell < grid.cellCount; cell++) {
      const ring = grid.cellRing(cell, 2);
      for (let k = 1; k < ring.length; k++) {
        const [lon0, lat0] = ring[k - 1];
        const [lon1, lat1] = ring[k];
        const r = Math.PI / 180;
        // Spherical law of cosines (fine at these step sizes).
        const cos = Math.sin(lat0 * r) * Math.sin(lat1 * r) + Math.cos(lat0 * r) * Math.cos(lat1 * r) * Math.cos((lon1 - lon0) * r);
        expect(Math.acos(Math.min(1, cos)) / r).toBeLessThanOrEqual(2 + 1e-9);
      }
    }
  });
});

describe('bands cell outlines', () => {
  it('each enclose 4π/N sr by d3-geo geoArea, for several DEG', () => {
    for (const deg of [90, 60, 45, 30, 10, 5, 2]) {
      const grid = new LatitudeBandsGrid(deg);
      const { rowCount, firstCell } = grid.layout;
      // The cells of a row are copies of each other turned about the axis: the first and last
      // cell of every row stand for the row.
      for (let row = 0; row < rowCount; row++) {
        for (const cell of [firstCell[row], firstCell[row + 1] - 1]) {
          const area = geoArea(d3Polygon(grid.cellRing(cell, deg / 1000)));
          expect(Math.abs(area / grid.cellAreaSr - 1), `${grid.name} cell ${cell}`).toBeLessThan(TOLERANCE);
        }
      }
    }
  });

  it('run counter-clockwise (RFC 7946) by turf booleanClockwise', () => {
    const grid = new LatitudeBandsGrid(10);
    for (const cell of [1, 100, 205, 300, grid.cellCount - 2]) {
      expect(booleanClockwise(lineString(grid.cellRing(cell))), `cell ${cell}`).toBe(false);
    }
  });
});
