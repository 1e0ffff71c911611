import type { RichnessInput } from './richness-input';

/**
 * The occupied cells of each slice, sorted by cell number: cells of slice s are
 * cells[cellFirst[s]] … cells[cellFirst[s + 1] − 1]; `localOfRow` is each row's position among its
 * slice's cells (an index relative to cellFirst[s]).
 */
export interface SliceCells {
  readonly cellFirst: Uint32Array;
  readonly cells: Uint32Array;
  readonly localOfRow: Uint32Array;
}

/** Sorts and deduplicates each slice's cells (O(rows log rows); cell numbers may be large). */
export function sliceCells(input: Pick<RichnessInput, 'start' | 'cell'>): SliceCells {
  const { start, cell } = input;
  const cellFirst = new Uint32Array(start.length);
  const cells = new Uint32Array(cell.length);
  const localOfRow = new Uint32Array(cell.length);
  let count = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    cellFirst[s] = count;
    const sorted = cell.slice(start[s], start[s + 1]).sort();
    for (let k = 0; k < sorted.length; k++) if (k === 0 || sorted[k] !== sorted[k - 1]) cells[count++] = sorted[k];
    const own = cells.subarray(cellFirst[s], count);
    for (let r = start[s]; r < start[s + 1]; r++) localOfRow[r] = lowerBound(own, cell[r]);
  }
  cellFirst[start.length - 1] = count;
  return { cellFirst, cells: cells.slice(0, count), localOfRow };
}

/** First index of a sorted array whose value is ≥ x. */
export function lowerBound(sorted: Uint32Array, x: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
