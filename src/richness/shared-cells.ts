import type { SliceAbundances } from './slice-abundances';
import type { SliceCells } from './slice-cells';
import { lowerBound } from './slice-cells';

/**
 * Richness held to a constant footprint between neighbouring slices: `sharedCells` are the cells
 * occupied in both slice s − 1 and slice s; `taxaSharedPrev` the distinct taxa of slice s − 1's
 * rows inside those cells and `taxaShared` those of slice s's rows. The first slice has no
 * previous one: NaN.
 */
export interface SharedCells {
  readonly sharedCells: Float64Array;
  readonly taxaSharedPrev: Float64Array;
  readonly taxaShared: Float64Array;
}

export function sharedCells(start: Uint32Array, abundances: SliceAbundances, cells: SliceCells): SharedCells {
  const sliceCount = start.length - 1;
  const out: SharedCells = {
    sharedCells: new Float64Array(sliceCount).fill(Number.NaN),
    taxaSharedPrev: new Float64Array(sliceCount).fill(Number.NaN),
    taxaShared: new Float64Array(sliceCount).fill(Number.NaN),
  };
  const { cellFirst, cells: cellList, localOfRow } = cells;
  // inShared[k] === s marks cell k (a global index into cellList) as shared by slices s − 1 and s.
  const inShared = new Int32Array(cellList.length).fill(-1);
  // Entries of different slices never coincide, so one stamp per s serves both slices.
  const seen = new Int32Array(abundances.taxon.length).fill(-1);
  for (let s = 1; s < sliceCount; s++) {
    const previous = cellList.subarray(cellFirst[s - 1], cellFirst[s]);
    let shared = 0;
    for (let k = cellFirst[s]; k < cellFirst[s + 1]; k++) {
      const p = lowerBound(previous, cellList[k]);
      if (p < previous.length && previous[p] === cellList[k]) {
        inShared[k] = s;
        inShared[cellFirst[s - 1] + p] = s;
        shared++;
      }
    }
    out.sharedCells[s] = shared;
    out.taxaSharedPrev[s] = taxaInMarkedCells(s - 1, s, start, abundances.entryOfRow, cellFirst, localOfRow, inShared, seen);
    out.taxaShared[s] = taxaInMarkedCells(s, s, start, abundances.entryOfRow, cellFirst, localOfRow, inShared, seen);
  }
  return out;
}

/** Distinct taxa (abundance entries) among the rows of `slice` whose cell is marked `mark`; stamps `seen` with `mark`. */
function taxaInMarkedCells(
  slice: number, mark: number, start: Uint32Array, entryOfRow: Uint32Array, cellFirst: Uint32Array,
  localOfRow: Uint32Array, inShared: Int32Array, seen: Int32Array,
): number {
  let taxa = 0;
  for (let r = start[slice]; r < start[slice + 1]; r++) {
    if (inShared[cellFirst[slice] + localOfRow[r]] !== mark) continue;
    const entry = entryOfRow[r];
    if (seen[entry] !== mark) {
      seen[entry] = mark;
      taxa++;
    }
  }
  return taxa;
}
