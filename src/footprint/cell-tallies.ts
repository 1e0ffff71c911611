import type { DistinctCounter } from './distinct-counter';
import type { SliceGroups } from './group-by-slice';

/** One entry per occupied (slice, cell), ordered by slice then cell; columnar. */
export interface CellTallies {
  readonly count: number;
  readonly slice: Uint32Array;
  readonly cell: Uint32Array;
  readonly occurrences: Uint32Array;
  readonly collections: Uint32Array;
  readonly taxa: Uint32Array;
}

/** Row positions within one slice must fit beside the cell number in a float64 sort key (cell < 2^30). */
const ROW_BITS = 2 ** 23;

/**
 * Tallies occurrences, distinct collections and distinct taxa per occupied cell of every slice.
 * Within a slice the rows are sorted by (cell, file order) through one numeric key, so the result
 * does not depend on hashing.
 */
export function tallyCells(
  groups: SliceGroups,
  cellOfRow: Uint32Array,
  collectionCodes: Uint32Array,
  taxonCodes: Uint32Array,
  collections: DistinctCounter,
  taxa: DistinctCounter,
): CellTallies {
  const { order, start } = groups;
  const total = order.length;
  const out = {
    slice: new Uint32Array(total),
    cell: new Uint32Array(total),
    occurrences: new Uint32Array(total),
    collections: new Uint32Array(total),
    taxa: new Uint32Array(total),
  };
  let largest = 0;
  for (let s = 0; s + 1 < start.length; s++) largest = Math.max(largest, start[s + 1] - start[s]);
  if (largest > ROW_BITS) throw new RangeError(`A slice holds ${largest} occurrences; at most ${ROW_BITS} are supported.`);
  const keys = new Float64Array(largest);
  const sorted = new Uint32Array(largest);
  let count = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    const from = start[s];
    const n = start[s + 1] - from;
    const sliceKeys = keys.subarray(0, n);
    for (let k = 0; k < n; k++) sliceKeys[k] = cellOfRow[order[from + k]] * ROW_BITS + k;
    sliceKeys.sort();
    for (let k = 0; k < n; k++) sorted[k] = order[from + (sliceKeys[k] % ROW_BITS)];
    let runStart = 0;
    while (runStart < n) {
      const cell = cellOfRow[sorted[runStart]];
      let runEnd = runStart + 1;
      while (runEnd < n && cellOfRow[sorted[runEnd]] === cell) runEnd++;
      out.slice[count] = s;
      out.cell[count] = cell;
      out.occurrences[count] = runEnd - runStart;
      out.collections[count] = collections.count(collectionCodes, sorted, runStart, runEnd);
      out.taxa[count] = taxa.count(taxonCodes, sorted, runStart, runEnd);
      count++;
      runStart = runEnd;
    }
  }
  return {
    count,
    slice: out.slice.subarray(0, count),
    cell: out.cell.subarray(0, count),
    occurrences: out.occurrences.subarray(0, count),
    collections: out.collections.subarray(0, count),
    taxa: out.taxa.subarray(0, count),
  };
}
