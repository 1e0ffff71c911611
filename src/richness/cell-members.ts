import type { SliceCells } from './slice-cells';

/** Distinct ids per occupied cell: ids of cell k (an index into SliceCells.cells) are member[first[k]] … member[first[k + 1] − 1]. */
export interface CellMembers {
  readonly first: Uint32Array;
  readonly member: Uint32Array;
}

/**
 * The distinct ids (taxa, collections) of the rows in each occupied cell of each slice. An id is
 * idOfRow[r], plus idBase[s] when ids are numbered within each slice. Counting sort of the rows
 * by cell, then one stamp per cell to drop repeats.
 */
export function cellMembers(start: Uint32Array, cells: SliceCells, idOfRow: Uint32Array, idBase?: Uint32Array): CellMembers {
  const { cellFirst, localOfRow } = cells;
  const cellCount = cells.cells.length;
  const cellOfRow = new Uint32Array(idOfRow.length);
  const id = new Uint32Array(idOfRow.length);
  const fill = new Uint32Array(cellCount + 1);
  let largest = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    const base = idBase ? idBase[s] : 0;
    for (let r = start[s]; r < start[s + 1]; r++) {
      cellOfRow[r] = cellFirst[s] + localOfRow[r];
      id[r] = idOfRow[r] + base;
      largest = Math.max(largest, id[r]);
      fill[cellOfRow[r] + 1]++;
    }
  }
  for (let k = 0; k < cellCount; k++) fill[k + 1] += fill[k];
  const grouped = new Uint32Array(idOfRow.length);
  const next = fill.slice(0, cellCount);
  for (let r = 0; r < idOfRow.length; r++) grouped[next[cellOfRow[r]]++] = id[r];
  const seen = new Int32Array(largest + 1).fill(-1);
  const first = new Uint32Array(cellCount + 1);
  let count = 0;
  for (let k = 0; k < cellCount; k++) {
    first[k] = count;
    for (let m = fill[k]; m < fill[k + 1]; m++) {
      const value = grouped[m];
      if (seen[value] !== k) {
        seen[value] = k;
        grouped[count++] = value;
      }
    }
  }
  first[cellCount] = count;
  return { first, member: grouped.slice(0, count) };
}
