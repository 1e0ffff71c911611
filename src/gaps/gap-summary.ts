/**
 * The gaps.csv measures of every slice, columnar: one entry per slice. Areas in km² on the
 * mean Earth sphere (cell count × cell area); positions in degrees.
 */
import type { CellTallies } from '../footprint/cell-tallies';
import { EARTH_RADIUS_KM } from '../sphere/earth';
import type { GapGrid } from './gap-grid';
import { type SliceGaps, sliceGaps } from './slice-gaps';

export interface GapSummary {
  readonly availableKm2: Float64Array;
  /** Area of the available cells holding an occurrence. */
  readonly sampledKm2: Float64Array;
  /** availableKm2 − sampledKm2. */
  readonly unsampledKm2: Float64Array;
  /** unsampledKm2 / availableKm2; NaN with nothing available. */
  readonly unsampledShare: Float64Array;
  readonly gaps: Uint32Array;
  /** Area and centre of the largest gap (the first in order among equals); NaN with no gap. */
  readonly largestGapKm2: Float64Array;
  readonly largestGapLat: Float64Array;
  readonly largestGapLon: Float64Array;
}

/** Cells occupied in each slice, ascending: cell[start[s]] … cell[start[s + 1] − 1]. */
export interface OccupiedCells {
  readonly start: Uint32Array;
  readonly cell: Uint32Array;
}

/** The occupied cells of each slice, read from the tallies (ordered by slice, then cell). */
export function occupiedCellsOf(tallies: CellTallies, sliceCount: number): OccupiedCells {
  const start = new Uint32Array(sliceCount + 1);
  for (let k = 0; k < tallies.count; k++) start[tallies.slice[k] + 1]++;
  for (let s = 0; s < sliceCount; s++) start[s + 1] += start[s];
  return { start, cell: tallies.cell.subarray(0, tallies.count) };
}

/**
 * Gaps of every slice: `available` is one mask for all slices, or one per slice (an area
 * reconstructed per slice); `occupied` the cells with occurrences, per slice.
 */
export function gapsBySlice(g: GapGrid, available: Uint8Array | readonly Uint8Array[], occupied: OccupiedCells): SliceGaps[] {
  const sliceCount = occupied.start.length - 1;
  if (Array.isArray(available) && available.length !== sliceCount) {
    throw new RangeError(`${available.length} availability masks for ${sliceCount} slices: expected one per slice.`);
  }
  const out: SliceGaps[] = [];
  for (let s = 0; s < sliceCount; s++) {
    const mask = available instanceof Uint8Array ? available : available[s];
    out.push(sliceGaps(g, mask, occupied.cell.subarray(occupied.start[s], occupied.start[s + 1])));
  }
  return out;
}

export function gapSummary(g: GapGrid, slices: readonly SliceGaps[]): GapSummary {
  const n = slices.length;
  const cellKm2 = g.grid.cellAreaSr * EARTH_RADIUS_KM * EARTH_RADIUS_KM;
  const out = {
    availableKm2: new Float64Array(n), sampledKm2: new Float64Array(n), unsampledKm2: new Float64Array(n),
    unsampledShare: new Float64Array(n), gaps: new Uint32Array(n),
    largestGapKm2: new Float64Array(n).fill(NaN), largestGapLat: new Float64Array(n).fill(NaN), largestGapLon: new Float64Array(n).fill(NaN),
  };
  slices.forEach((slice, s) => {
    const unsampledCells = slice.availableCells - slice.sampledCells;
    out.availableKm2[s] = slice.availableCells * cellKm2;
    out.sampledKm2[s] = slice.sampledCells * cellKm2;
    out.unsampledKm2[s] = unsampledCells * cellKm2;
    out.unsampledShare[s] = slice.availableCells === 0 ? NaN : unsampledCells / slice.availableCells;
    out.gaps[s] = slice.gapCount;
    let largest = -1;
    for (let gap = 0; gap < slice.gapCount; gap++) if (largest < 0 || slice.areaKm2[gap] > slice.areaKm2[largest]) largest = gap;
    if (largest >= 0) {
      out.largestGapKm2[s] = slice.areaKm2[largest];
      out.largestGapLat[s] = slice.centreLat[largest];
      out.largestGapLon[s] = slice.centreLon[largest];
    }
  });
  return out;
}
