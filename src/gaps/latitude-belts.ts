/**
 * The belts.csv measures: per slice and latitude band, occurrences, occupied cells, available
 * cells and indicator sites by kind, with each band's share of the slice's occurrences and of
 * its occupied cells; per slice, how far its occurrences' latitudes moved from the slice
 * before it (earth mover's distance, degrees). Band b covers [−90 + b·bandDeg,
 * −90 + (b + 1)·bandDeg) (the North Pole in the last band), as in latitudeHistogram; a cell is
 * in the band of its centre.
 */
import { groupBySlice } from '../footprint/group-by-slice';
import { latitudeHistogram } from '../footprint/latitude-histogram';
import type { IndicatorSummary } from '../indicators/indicator-summary';
import { earthMoversDistanceSorted } from './earth-movers-distance';
import type { GapGrid } from './gap-grid';
import type { OccupiedCells } from './gap-summary';

/** Band width when none is given, degrees. */
export const DEFAULT_BELT_DEG = 10;

export interface LatitudeBelts {
  readonly sliceCount: number;
  readonly bandDeg: number;
  readonly bands: number;
  /** Per (slice, band) at slice · bands + band. */
  readonly occurrences: Uint32Array;
  readonly occupiedCells: Uint32Array;
  readonly availableCells: Uint32Array;
  /** The band's share of the slice's occurrences and occupied cells; NaN for a slice with none. */
  readonly occurrenceShare: Float64Array;
  readonly occupiedShare: Float64Array;
  /** Per slice: earth mover's distance (degrees) between its occurrences' latitudes and those of
   * the slice before it in order; NaN for the first slice and where either has none. */
  readonly shiftDeg: Float64Array;
  /** Indicator sites by kind and band, when indicators were given (bands must agree). */
  readonly indicators?: IndicatorSummary;
}

export interface BeltInputs {
  /** Each occurrence's slice (−1: not counted) and palaeolatitude, degrees. */
  readonly sliceOf: Int32Array;
  readonly latDeg: Float64Array;
  readonly occupied: OccupiedCells;
  /** One availability mask for all slices, or one per slice (see gapsBySlice). */
  readonly available: Uint8Array | readonly Uint8Array[];
  readonly indicators?: IndicatorSummary;
}

export function latitudeBelts(g: GapGrid, input: BeltInputs, bandDeg = DEFAULT_BELT_DEG): LatitudeBelts {
  const sliceCount = input.occupied.start.length - 1;
  if (input.indicators !== undefined && (input.indicators.bandDeg !== bandDeg || input.indicators.sliceCount !== sliceCount)) {
    throw new RangeError(
      `Indicator summary has ${input.indicators.sliceCount} slices in ${input.indicators.bandDeg}° bands: expected ${sliceCount} slices in ${bandDeg}° bands.`,
    );
  }
  const occurrences = latitudeHistogram(input.sliceOf, input.latDeg, sliceCount, bandDeg);
  const bands = occurrences.bands;
  const occupiedCells = cellsPerBand(g, input.occupied, sliceCount, bandDeg);
  const availableCells = new Uint32Array(sliceCount * bands);
  const available = input.available;
  if (available instanceof Uint8Array) {
    const once = cellsPerBand(g, maskCells(available), 1, bandDeg);
    for (let s = 0; s < sliceCount; s++) availableCells.set(once, s * bands);
  } else {
    available.forEach((mask, s) => availableCells.set(cellsPerBand(g, maskCells(mask), 1, bandDeg), s * bands));
  }
  return {
    sliceCount, bandDeg, bands, occurrences: occurrences.perSlice, occupiedCells, availableCells,
    occurrenceShare: shares(occurrences.perSlice, bands), occupiedShare: shares(occupiedCells, bands),
    shiftDeg: latitudeShifts(input.sliceOf, input.latDeg, sliceCount), indicators: input.indicators,
  };
}

/** Cells per (slice, band), each cell in the band of its centre. */
function cellsPerBand(g: GapGrid, cells: OccupiedCells, sliceCount: number, bandDeg: number): Uint32Array {
  const sliceOf = new Int32Array(cells.cell.length), lat = new Float64Array(cells.cell.length);
  for (let s = 0; s < sliceCount; s++) sliceOf.fill(s, cells.start[s], cells.start[s + 1]);
  for (let k = 0; k < cells.cell.length; k++) lat[k] = g.centreLat[cells.cell[k]];
  return latitudeHistogram(sliceOf, lat, sliceCount, bandDeg).perSlice;
}

function maskCells(mask: Uint8Array): OccupiedCells {
  const cell: number[] = [];
  for (let c = 0; c < mask.length; c++) if (mask[c] !== 0) cell.push(c);
  return { start: Uint32Array.of(0, cell.length), cell: Uint32Array.from(cell) };
}

/** Each band's count over its slice's total. */
function shares(counts: Uint32Array, bands: number): Float64Array {
  const out = new Float64Array(counts.length);
  for (let base = 0; base < counts.length; base += bands) {
    let total = 0;
    for (let b = 0; b < bands; b++) total += counts[base + b];
    for (let b = 0; b < bands; b++) out[base + b] = total === 0 ? NaN : counts[base + b] / total;
  }
  return out;
}

/** Earth mover's distance between each slice's latitudes and the previous slice's. */
function latitudeShifts(sliceOf: Int32Array, latDeg: Float64Array, sliceCount: number): Float64Array {
  const { order, start } = groupBySlice(sliceOf, sliceCount);
  const sorted = new Float64Array(order.length);
  for (let k = 0; k < order.length; k++) sorted[k] = latDeg[order[k]];
  const out = new Float64Array(sliceCount).fill(NaN);
  for (let s = 0; s < sliceCount; s++) {
    sorted.subarray(start[s], start[s + 1]).sort();
    if (s > 0) out[s] = earthMoversDistanceSorted(sorted.subarray(start[s - 1], start[s]), sorted.subarray(start[s], start[s + 1]));
  }
  return out;
}
