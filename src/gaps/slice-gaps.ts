/**
 * One slice's cells in three classes — sampled (available and holding an occurrence),
 * unsampled-available, outside (not available, sampled or not) — and its unsampled-available
 * cells grouped into gaps: sets of cells joined through shared edges (not through corners).
 * Each gap gets its area (cell count × cell area) and centre (spherical centroid of its cells'
 * centres). Gaps are numbered in the order of their lowest cell.
 */
import { EARTH_RADIUS_KM } from '../sphere/earth';
import { sphericalCentroid } from '../sphere/spherical-centroid';
import type { GapGrid } from './gap-grid';

export interface SliceGaps {
  /** Cells available (centre inside the area). */
  readonly availableCells: number;
  /** Available cells holding an occurrence of the slice. */
  readonly sampledCells: number;
  /** Cells holding an occurrence of the slice but outside the area: counted, not a gap. */
  readonly sampledOutsideCells: number;
  readonly gapCount: number;
  /** Cells of gap g: cells[cellStart[g]] … cells[cellStart[g + 1] − 1], ascending. */
  readonly cellStart: Uint32Array;
  readonly cells: Uint32Array;
  /** Area of each gap, km² on the mean Earth sphere. */
  readonly areaKm2: Float64Array;
  /** Centre of each gap, degrees; NaN where its cells' centres balance out (no direction). */
  readonly centreLat: Float64Array;
  readonly centreLon: Float64Array;
}

/**
 * The slice's gaps. `available` has one byte per cell (non-zero: available); `occupied` holds
 * the cells with an occurrence of the slice, ascending, each once.
 */
export function sliceGaps(g: GapGrid, available: Uint8Array, occupied: Uint32Array): SliceGaps {
  const { cellCount } = g.grid;
  // 0 outside, 1 unsampled-available, 2 sampled; then a gap's cells are marked 3 once reached.
  const state = new Uint8Array(cellCount);
  let availableCells = 0;
  for (let c = 0; c < cellCount; c++) {
    if (available[c] !== 0) {
      state[c] = 1;
      availableCells++;
    }
  }
  let sampledCells = 0;
  for (let k = 0; k < occupied.length; k++) {
    if (state[occupied[k]] === 1) {
      state[occupied[k]] = 2;
      sampledCells++;
    }
  }
  const cells = new Uint32Array(availableCells - sampledCells);
  const starts: number[] = [0];
  const { start, neighbour } = g.adjacency;
  let filled = 0;
  for (let seed = 0; seed < cellCount; seed++) {
    if (state[seed] !== 1) continue;
    // Breadth-first through shared edges; `cells` doubles as the queue.
    const first = filled;
    state[seed] = 3;
    cells[filled++] = seed;
    for (let head = first; head < filled; head++) {
      const c = cells[head];
      for (let k = start[c]; k < start[c + 1]; k++) {
        const n = neighbour[k];
        if (state[n] === 1) {
          state[n] = 3;
          cells[filled++] = n;
        }
      }
    }
    cells.subarray(first, filled).sort();
    starts.push(filled);
  }
  const gapCount = starts.length - 1;
  const cellKm2 = g.grid.cellAreaSr * EARTH_RADIUS_KM * EARTH_RADIUS_KM;
  const areaKm2 = new Float64Array(gapCount), centreLat = new Float64Array(gapCount), centreLon = new Float64Array(gapCount);
  const xyz = new Float64Array(3 * cells.length);
  const centres = g.centreXyz;
  for (let k = 0; k < cells.length; k++) {
    const o = 3 * cells[k];
    xyz[3 * k] = centres[o];
    xyz[3 * k + 1] = centres[o + 1];
    xyz[3 * k + 2] = centres[o + 2];
  }
  for (let gap = 0; gap < gapCount; gap++) {
    const from = starts[gap], to = starts[gap + 1];
    areaKm2[gap] = (to - from) * cellKm2;
    const centre = sphericalCentroid(xyz.subarray(3 * from, 3 * to));
    centreLat[gap] = centre.latDeg;
    centreLon[gap] = centre.lonDeg;
  }
  return {
    availableCells, sampledCells, sampledOutsideCells: occupied.length - sampledCells, gapCount,
    cellStart: Uint32Array.from(starts), cells, areaKm2, centreLat, centreLon,
  };
}
