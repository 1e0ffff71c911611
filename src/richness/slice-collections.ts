import type { RichnessInput } from './richness-input';
import { ABSENT_CODE } from '../table/occurrence-table';

/**
 * The collections of each slice, numbered 0 … within the slice in order of first appearance,
 * and the rows grouped by them. Collection c of slice s has the global number
 * g = collectionFirst[s] + c, and its rows are rows[begin[g]] … rows[end[g] − 1]. A row naming
 * no collection is a collection of its own.
 */
export interface SliceCollections {
  /** Local collection number of each row. */
  readonly localOfRow: Uint32Array;
  /** sliceCount + 1 offsets into the global collection numbers. */
  readonly collectionFirst: Uint32Array;
  readonly begin: Uint32Array;
  readonly end: Uint32Array;
  /** Row indices in slice order, grouped by collection within each slice. */
  readonly rows: Uint32Array;
}

/** Groups rows by collection within each slice with a counting sort (O(rows + collectionCount)). */
export function sliceCollections(input: Pick<RichnessInput, 'start' | 'collection' | 'collectionCount'>): SliceCollections {
  const { start, collection } = input;
  const rowCount = collection.length;
  const localOfCode = new Uint32Array(input.collectionCount);
  const owner = new Int32Array(input.collectionCount).fill(-1);
  const localOfRow = new Uint32Array(rowCount);
  const collectionFirst = new Uint32Array(start.length);
  let total = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    collectionFirst[s] = total;
    let local = 0;
    for (let r = start[s]; r < start[s + 1]; r++) {
      const code = collection[r];
      if (code === ABSENT_CODE) {
        localOfRow[r] = local++;
      } else {
        if (owner[code] !== s) {
          owner[code] = s;
          localOfCode[code] = local++;
        }
        localOfRow[r] = localOfCode[code];
      }
    }
    total += local;
  }
  collectionFirst[start.length - 1] = total;
  const begin = new Uint32Array(total);
  const end = new Uint32Array(total);
  const rows = new Uint32Array(rowCount);
  for (let s = 0; s + 1 < start.length; s++) {
    const base = collectionFirst[s];
    for (let r = start[s]; r < start[s + 1]; r++) end[base + localOfRow[r]]++;
    let offset = start[s];
    for (let c = base; c < collectionFirst[s + 1]; c++) {
      begin[c] = offset;
      offset += end[c];
      end[c] = begin[c];
    }
    for (let r = start[s]; r < start[s + 1]; r++) rows[end[base + localOfRow[r]]++] = r;
  }
  return { localOfRow, collectionFirst, begin, end, rows };
}
