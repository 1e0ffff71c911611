import { describe, expect, it } from 'vitest';
import { geoArea } from 'd3-geo';
import type { MultiPolygon, Polygon } from 'geojson';
import { parseGridName } from '../../src/grid';
import { gapOutlines, gapsBySlice, gapSummary, type GapGrid, prepareGapGrid, sliceGaps } from '../../src/gaps';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';
import { d3Area, geometryProblems } from '../export/polygon-checks';

const R2 = EARTH_RADIUS_KM * EARTH_RADIUS_KM;
const gapGrids = new Map<string, GapGrid>();
const gapGrid = (name: string): GapGrid => {
  let g = gapGrids.get(name);
  if (g === undefined) gapGrids.set(name, (g = prepareGapGrid(parseGridName(name))));
  return g;
};
const cellsWhere = (g: GapGrid, keep: (cell: number) => boolean) =>
  Uint32Array.from({ length: g.grid.cellCount }, (_, c) => c).filter(keep);
const everywhere = (g: GapGrid) => new Uint8Array(g.grid.cellCount).fill(1);

/** d3-geo area (sr) of a cell's own outline, read clockwise as d3 wants (STACK.md). */
const cellD3Area = (g: GapGrid, cell: number) => geoArea({ type: 'Polygon', coordinates: [[...g.grid.cellRing(cell)].reverse()] });

/** Seeded uniform numbers in [0, 1) (a linear congruential generator, Numerical Recipes' constants). */
function random(seed: number): () => number {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}

describe('the cell mesh', () => {
  it.each(['healpix:1', 'healpix:2', 'healpix:4', 'healpix:16', 'healpix:32', 'bands:5', 'bands:10', 'bands:30', 'bands:45'])(
    'of %s fits together edge for edge (building it checks every edge has its twin)', (name) => {
      expect(() => gapGrid(name)).not.toThrow();
    },
  );

  it.each(['healpix:1', 'healpix:4', 'healpix:32'])('gives every HEALPix cell of %s four edge neighbours (Górski et al. 2005, §4: quadrilateral pixels)', (name) => {
    const { adjacency, grid } = gapGrid(name);
    for (let c = 0; c < grid.cellCount; c++) expect(adjacency.start[c + 1] - adjacency.start[c]).toBe(4);
  });
});

describe('a configuration with a known answer', () => {
  it.each(['bands:10', 'bands:30'])('on %s, the northern hemisphere sampled leaves the southern as one gap of 2πR²', (name) => {
    const g = gapGrid(name);
    const north = cellsWhere(g, (c) => g.centreLat[c] > 0);
    const gaps = sliceGaps(g, everywhere(g), north);
    expect(gaps.gapCount).toBe(1);
    // A hemisphere is 2π sr (closed form; d3-geo's own test checks the same of its geoArea).
    expect(gaps.areaKm2[0] / (2 * Math.PI * R2) - 1).toBeCloseTo(0, 12);
    expect(gaps.centreLat[0]).toBeCloseTo(-90, 9);
    const [outline] = gapOutlines(g, gaps);
    expect(geometryProblems(outline)).toEqual([]);
    expect(d3Area(outline)).toBeCloseTo(2 * Math.PI, 9);
  });

  it.each([1, 2, 8, 32])('on healpix:%i, the four northern base faces sampled leave the other eight, 8/12 of 4πR²', (nside) => {
    const g = gapGrid(`healpix:${nside}`);
    // NESTED numbers put base face f at f·nside² … (f + 1)·nside² − 1 (Górski et al. 2005, §3).
    const gaps = sliceGaps(g, everywhere(g), cellsWhere(g, (c) => c < 4 * nside * nside));
    expect(gaps.gapCount).toBe(1);
    expect(gaps.areaKm2[0] / ((8 / 12) * 4 * Math.PI * R2) - 1).toBeCloseTo(0, 12);
    const [outline] = gapOutlines(g, gaps);
    expect(geometryProblems(outline)).toEqual([]);
    // The boundary follows the faces' edges, which 1° steps read as great circles approximate.
    expect(d3Area(outline) / ((8 / 12) * 4 * Math.PI) - 1).toBeCloseTo(0, 3);
  });

  it('nothing available leaves no gap and an undefined share; nothing sampled leaves the whole sphere', () => {
    const g = gapGrid('healpix:4');
    const none = sliceGaps(g, new Uint8Array(g.grid.cellCount), new Uint32Array(0));
    const all = sliceGaps(g, everywhere(g), new Uint32Array(0));
    const summary = gapSummary(g, [none, all]);
    expect(summary.gaps[0]).toBe(0);
    expect(summary.unsampledShare[0]).toBeNaN();
    expect(summary.largestGapKm2[0]).toBeNaN();
    expect(summary.gaps[1]).toBe(1);
    expect(summary.unsampledKm2[1] / (4 * Math.PI * R2) - 1).toBeCloseTo(0, 12);
    expect(summary.unsampledShare[1]).toBe(1);
    // The whole sphere's cell centres balance out: no centre (Mardia & Jupp 2000, §9.2).
    expect(summary.largestGapLat[1]).toBeNaN();
    // Its outline runs round the border of the plane, which d3-geo reads as the whole sphere, 4π sr.
    const [outline] = gapOutlines(g, all);
    expect(geometryProblems(outline)).toEqual([]);
    expect(d3Area(outline)).toBeCloseTo(4 * Math.PI, 9);
  });
});

describe.each(['healpix:4', 'healpix:8', 'healpix:16', 'bands:10', 'bands:15'])('random gaps on %s', (name) => {
  const g = gapGrid(name);
  const draws = [0.2, 0.5, 0.8].map((p, i) => {
    const next = random(1000 * i + name.length);
    const available = new Uint8Array(g.grid.cellCount).map(() => (next() < 0.9 ? 1 : 0));
    const occupied = cellsWhere(g, () => next() < p);
    return { available, occupied, gaps: sliceGaps(g, available, occupied) };
  });

  it('count as gaps exactly the available cells without occurrences, each once', () => {
    for (const { available, occupied, gaps } of draws) {
      const expected = cellsWhere(g, (c) => available[c] === 1 && !occupied.includes(c));
      expect(Uint32Array.from(gaps.cells).sort()).toEqual(expected);
    }
  });

  it('give each gap the area of its cells, count × 4πR²/cells (Górski et al. 2005, eq. 1 for HEALPix)', () => {
    for (const { gaps } of draws) {
      for (let k = 0; k < gaps.gapCount; k++) {
        const count = gaps.cellStart[k + 1] - gaps.cellStart[k];
        expect(gaps.areaKm2[k] / ((count * 4 * Math.PI * R2) / g.grid.cellCount) - 1).toBeCloseTo(0, 12);
      }
    }
  });

  it('join cells only through shared edges: no two gaps have cells that are neighbours', () => {
    for (const { gaps } of draws) {
      const gapOf = new Int32Array(g.grid.cellCount).fill(-1);
      for (let k = 0; k < gaps.gapCount; k++) for (let i = gaps.cellStart[k]; i < gaps.cellStart[k + 1]; i++) gapOf[gaps.cells[i]] = k;
      for (const c of gaps.cells) {
        for (let i = g.adjacency.start[c]; i < g.adjacency.start[c + 1]; i++) {
          const n = g.adjacency.neighbour[i];
          if (gapOf[n] >= 0) expect(gapOf[n]).toBe(gapOf[c]);
        }
      }
    }
  });

  it('outline every gap with polygons valid to turf, no repeated position, and the area of its cells (d3-geo geoArea)', () => {
    for (const { gaps } of draws) {
      const outlines = gapOutlines(g, gaps);
      expect(outlines).toHaveLength(gaps.gapCount);
      outlines.forEach((outline: Polygon | MultiPolygon, k) => {
        expect(geometryProblems(outline)).toEqual([]);
        let cellsArea = 0;
        for (let i = gaps.cellStart[k]; i < gaps.cellStart[k + 1]; i++) cellsArea += cellD3Area(g, gaps.cells[i]);
        const count = gaps.cellStart[k + 1] - gaps.cellStart[k];
        // Dissolving shared edges changes no area beyond how d3 reads the steps (each ≤ 1° step a
        // great circle): on HEALPix the outline's d3 area is the sum of its cells' up to the points
        // put in at the cut (relative 1e-6 per cell in polygon-validity.test.ts, 1e-5 here); on a
        // bands grid the merge also puts in, on each row edge, the vertices of the row beyond,
        // and near the poles a step on a parallel spans several degrees of longitude, whose
        // great-circle reading those vertices change (1e-3). Both are count × cell area to the
        // 2e-3 that cells-geojson.test.ts allows a single cell.
        expect(Math.abs(d3Area(outline) / cellsArea - 1)).toBeLessThan(name.startsWith('healpix') ? 1e-5 : 1e-3);
        expect(Math.abs(d3Area(outline) / (count * g.grid.cellAreaSr) - 1)).toBeLessThan(2e-3);
      });
    }
  });
});

describe('the classes of a slice', () => {
  it('count sampled cells inside the area as sampled and those outside apart, as neither gap nor sample', () => {
    const g = gapGrid('healpix:2');
    const available = new Uint8Array(g.grid.cellCount);
    available.fill(1, 0, 10);
    const gaps = sliceGaps(g, available, Uint32Array.of(1, 2, 20, 30));
    expect([gaps.availableCells, gaps.sampledCells, gaps.sampledOutsideCells, gaps.cells.length]).toEqual([10, 2, 2, 8]);
  });
});

describe('gapsBySlice', () => {
  it('takes one mask for all slices or one per slice, and refuses a wrong number of masks', () => {
    const g = gapGrid('healpix:2');
    const occupied = { start: Uint32Array.of(0, 2, 3), cell: Uint32Array.of(0, 5, 7) };
    const shared = gapsBySlice(g, everywhere(g), occupied);
    const perSlice = gapsBySlice(g, [everywhere(g), everywhere(g)], occupied);
    expect(shared.map((s) => s.sampledCells)).toEqual([2, 1]);
    expect(perSlice.map((s) => s.sampledCells)).toEqual([2, 1]);
    expect(() => gapsBySlice(g, [everywhere(g)], occupied)).toThrow('1 availability masks for 2 slices: expected one per slice.');
  });
});
