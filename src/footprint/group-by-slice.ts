/** Rows grouped by slice: rows of slice s are order[start[s]] … order[start[s + 1] - 1], in file order. */
export interface SliceGroups {
  readonly order: Uint32Array;
  /** sliceCount + 1 offsets into `order`. */
  readonly start: Uint32Array;
}

/**
 * Counting sort of row indices by slice (rows with slice -1 are left out). Stable, so rows keep
 * their file order within a slice, which keeps every later step deterministic.
 */
export function groupBySlice(sliceOfRow: Int32Array, sliceCount: number): SliceGroups {
  const start = new Uint32Array(sliceCount + 1);
  for (let i = 0; i < sliceOfRow.length; i++) {
    const s = sliceOfRow[i];
    if (s >= 0) start[s + 1]++;
  }
  for (let s = 0; s < sliceCount; s++) start[s + 1] += start[s];
  const order = new Uint32Array(start[sliceCount]);
  const next = start.slice(0, sliceCount);
  for (let i = 0; i < sliceOfRow.length; i++) {
    const s = sliceOfRow[i];
    if (s >= 0) order[next[s]++] = i;
  }
  return { order, start };
}
