import type { DistinctCounter } from './distinct-counter';

/** One entry per occupied (slice, cell), ordered by slice then cell; columnar. */
export interface CellTallies {
  readonly count: number;
  readonly slice: Uint32Array;
  readonly cell: Uint32Array;
  readonly occurrences: Uint32Array;
  readonly collections: Uint32Array;
  readonly taxa: Uint32Array;
}

/** Columns of the placed rows in slice order: rows of slice s are start[s] … start[s + 1] − 1. */
export interface SliceOrderedRows {
  readonly start: Uint32Array;
  readonly cell: Uint32Array;
  readonly collection: Uint32Array;
  readonly taxon: Uint32Array;
}

/** Row positions within one slice must fit beside the cell number in a float64 sort key (cell < 2^30). */
const ROW_BITS = 2 ** 23;

/**
 * Tallies occurrences, distinct collections and distinct taxa per occupied cell of every slice.
 * Within a slice the rows are sorted by (cell, position) through one numeric key, so the result
 * does not depend on hashing.
 */
export function tallyCells(rows: SliceOrderedRows, collections: DistinctCounter, taxa: DistinctCounter): CellTallies {
  const { start, cell: cellOf } = rows;
  const total = cellOf.length;
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
    for (let k = 0; k < n; k++) sliceKeys[k] = cellOf[from + k] * ROW_BITS + k;
    sliceKeys.sort();
    for (let k = 0; k < n; k++) {
      const key = sliceKeys[k];
      sorted[k] = from + (key - Math.floor(key / ROW_BITS) * ROW_BITS);
    }
    let runStart = 0;
    while (runStart < n) {
      const cell = cellOf[sorted[runStart]];
      let runEnd = runStart + 1;
      while (runEnd < n && cellOf[sorted[runEnd]] === cell) runEnd++;
      out.slice[count] = s;
      out.cell[count] = cell;
      out.occurrences[count] = runEnd - runStart;
      out.collections[count] = collections.count(rows.collection, sorted, runStart, runEnd);
      out.taxa[count] = taxa.count(rows.taxon, sorted, runStart, runEnd);
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
