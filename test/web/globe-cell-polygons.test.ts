// Cell polygons for the WebGL map: buffers checked against the grid's own rings (src/grid) and
// countScale's colours, and the fan triangulation checked with Gauss's shoelace formula for
// signed area (a triangle (a, b, c) is counter-clockwise iff its signed area is positive) and the
// winding number (angles about the apex add up to exactly 2π once for a star-shaped ring).
import { describe, expect, it } from 'vitest';
import { HealpixGrid, LatitudeBandsGrid } from '../../src/grid';
import type { EqualAreaGrid } from '../../src/grid';
import { countScale } from '../../web/colour/measure-scale';
import { buildCellPolygons } from '../../web/map/cell-polygons';
import { FIXTURE_CELLS, FIXTURE_GRID, FIXTURE_OCCURRENCES, fixtureView } from './globe-fixture';

const signedArea = (p: Float32Array, a: number, b: number, c: number): number =>
  0.5 * ((p[b * 2] - p[a * 2]) * (p[c * 2 + 1] - p[a * 2 + 1]) - (p[c * 2] - p[a * 2]) * (p[b * 2 + 1] - p[a * 2 + 1]));

describe('buildCellPolygons', () => {
  const view = fixtureView();
  const scale = countScale(120);

  it('copies each cell ring of the slice from the grid, followed by one apex vertex', () => {
    const built = buildCellPolygons(view.cells, view.shapes, 1, view.cells.occurrences, scale);
    expect(built.length).toBe(2);
    expect(built.firstEntry).toBe(3);
    FIXTURE_CELLS[1].forEach((cell, i) => {
      const ring = FIXTURE_GRID.cellRing(cell, 5);
      expect(built.startIndices[i + 1] - built.startIndices[i]).toBe(ring.length + 1);
      ring.forEach(([lon, lat], v) => {
        const at = built.startIndices[i] + v;
        expect(built.positions[at * 2]).toBeCloseTo(lon, 4);
        expect(built.positions[at * 2 + 1]).toBeCloseTo(lat, 4);
      });
    });
    expect(built.startIndices[2] * 2).toBe(built.positions.length);
  });

  it('colours every vertex of a cell with countScale applied to that cell’s count', () => {
    const built = buildCellPolygons(view.cells, view.shapes, 0, view.cells.occurrences, scale);
    const expected = new Uint8Array(3);
    for (let i = 0; i < built.length; i++) {
      scale.colourInto(FIXTURE_OCCURRENCES[i], expected, 0);
      for (let v = built.startIndices[i]; v < built.startIndices[i + 1]; v++) {
        expect([...built.colours.subarray(v * 3, v * 3 + 3)]).toEqual([...expected]);
      }
    }
    // The 120-occurrence cell takes the top of the scale, the single one its bottom: distinct colours.
    expect(built.colours[built.startIndices[2] * 3]).not.toBe(built.colours[0]);
  });

  it('puts the apex at the mean of the ring’s distinct vertices', () => {
    const built = buildCellPolygons(view.cells, view.shapes, 0, view.cells.occurrences, scale);
    const ring = FIXTURE_GRID.cellRing(FIXTURE_CELLS[0][0], 5).slice(0, -1);
    const apex = built.startIndices[1] - 1;
    expect(built.positions[apex * 2]).toBeCloseTo(ring.reduce((s, [lon]) => s + lon, 0) / ring.length, 4);
    expect(built.positions[apex * 2 + 1]).toBeCloseTo(ring.reduce((s, [, lat]) => s + lat, 0) / ring.length, 4);
  });

  it('writes one triangle per ring edge, each inside its own polygon’s vertex range', () => {
    const built = buildCellPolygons(view.cells, view.shapes, 1, view.cells.occurrences, scale);
    const ringLengths = FIXTURE_CELLS[1].map((cell) => FIXTURE_GRID.cellRing(cell, 5).length);
    expect(built.indices.length).toBe(3 * ringLengths.reduce((s, n) => s + n - 1, 0));
    let t = 0;
    for (let i = 0; i < built.length; i++) {
      for (let k = 0; k < ringLengths[i] - 1; k++, t++) {
        for (let j = 0; j < 3; j++) {
          expect(built.indices[t * 3 + j]).toBeGreaterThanOrEqual(built.startIndices[i]);
          expect(built.indices[t * 3 + j]).toBeLessThan(built.startIndices[i + 1]);
        }
      }
    }
  });

  it('gives an empty slice empty buffers', () => {
    const empty = { ...view.cells, sliceStart: Uint32Array.of(0, 0) };
    const built = buildCellPolygons(empty, view.shapes, 0, view.cells.occurrences, scale);
    expect([built.length, built.positions.length, built.indices.length, [...built.startIndices]]).toEqual([0, 0, 0, [0]]);
  });
});

describe('the fan triangulation', () => {
  // Every cell of a grid as its own one-cell slice.
  function allCells(grid: EqualAreaGrid) {
    const ringStart = [0];
    const coords: number[] = [];
    for (let cell = 0; cell < grid.cellCount; cell++) {
      for (const [lon, lat] of grid.cellRing(cell, 1)) coords.push(lon, lat);
      ringStart.push(coords.length / 2);
    }
    const n = grid.cellCount;
    const ids = Uint32Array.from({ length: n }, (_, k) => k);
    const cells = { sliceStart: Uint32Array.of(0, n), cell: ids, shape: ids, occurrences: ids, collections: ids, taxa: ids };
    const shapes = { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: new Float32Array(2 * n) };
    return buildCellPolygons(cells, shapes, 0, ids, countScale(n));
  }

  for (const grid of [new HealpixGrid(16), new LatitudeBandsGrid(10)]) {
    it(`covers every ${grid.name} cell exactly once: counter-clockwise triangles winding once round the apex`, () => {
      const built = allCells(grid);
      const p = built.positions;
      let t = 0;
      for (let i = 0; i < built.length; i++) {
        const triangles = built.startIndices[i + 1] - built.startIndices[i] - 2;
        let turn = 0;
        for (let k = 0; k < triangles; k++, t++) {
          const [a, b, c] = built.indices.subarray(t * 3, t * 3 + 3);
          expect(signedArea(p, a, b, c), `${grid.name} cell ${i} edge ${k}`).toBeGreaterThan(0);
          turn += Math.atan2(signedArea(p, a, b, c) * 2,
            (p[b * 2] - p[a * 2]) * (p[c * 2] - p[a * 2]) + (p[b * 2 + 1] - p[a * 2 + 1]) * (p[c * 2 + 1] - p[a * 2 + 1]));
        }
        expect(turn, `${grid.name} cell ${i}`).toBeCloseTo(2 * Math.PI, 6);
      }
    });
  }
});
