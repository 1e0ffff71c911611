/**
 * Groups equal tuples of numbers (positions as canonical degree pairs, unit vectors as triples)
 * with an open-addressing hash table on the bits of the values: no string keys, no per-item
 * objects, O(n) expected. The table grows with the number of distinct tuples, so data with many
 * repeats stays in cache.
 */

export interface TupleGroups {
  /** Number of distinct tuples. */
  readonly count: number;
  /** Index of the first tuple of each group (length `count`); groups are numbered 0.. in order
   * of first appearance. */
  readonly first: Uint32Array;
}

/**
 * Groups the tuples `values[k·stride … k·stride + stride − 1]`. Tuples are equal when all their
 * numbers are (===). The values must hold no NaN and no −0 (callers canonicalise them): then
 * equal values have equal bits, so hashing the bits agrees with ===. When `groupOf` is given,
 * the group of each tuple is written into it.
 */
export function groupEqualTuples(values: Float64Array, stride: number, groupOf?: Uint32Array): TupleGroups {
  const n = Math.floor(values.length / stride);
  const words = new Uint32Array(values.buffer, values.byteOffset, 2 * stride * n);
  const wordsPerTuple = 2 * stride;
  const first = new Uint32Array(n);
  const hashOf = new Int32Array(n); // hash of each group's tuple, for rehashing
  // Each group's tuple, packed: comparisons read this small array, not the whole input.
  const groupValues = new Float64Array(stride * n);
  let size = 1024;
  let mask = size - 1;
  let slots = new Int32Array(size); // group + 1, 0 = empty
  let count = 0;
  for (let k = 0; k < n; k++) {
    const base = k * wordsPerTuple;
    let h = 0x811c9dc5;
    for (let w = 0; w < wordsPerTuple; w++) h = mixHash(h, words[base + w]);
    h = finishHash(h);
    for (let slot = h & mask; ; slot = (slot + 1) & mask) {
      const stored = slots[slot];
      if (stored === 0) {
        slots[slot] = count + 1;
        hashOf[count] = h;
        first[count] = k;
        for (let i = 0; i < stride; i++) groupValues[count * stride + i] = values[k * stride + i];
        if (groupOf !== undefined) groupOf[k] = count;
        count++;
        break;
      }
      const g = stored - 1;
      if (hashOf[g] === h && tuplesEqual(groupValues, g, values, k, stride)) {
        if (groupOf !== undefined) groupOf[k] = g;
        break;
      }
    }
    if (2 * count > size) {
      // Keep the load factor at most 1/2: double the table and re-insert every group.
      size *= 2;
      mask = size - 1;
      slots = new Int32Array(size);
      for (let g = 0; g < count; g++) {
        let slot = hashOf[g] & mask;
        while (slots[slot] !== 0) slot = (slot + 1) & mask;
        slots[slot] = g + 1;
      }
    }
  }
  return { count, first: first.subarray(0, count) };
}

/** Folds a 32-bit word into a running hash (multiplicative mixing; common practice). */
function mixHash(h: number, word: number): number {
  return Math.imul(h ^ word, 0x9e3779b1) ^ (h >>> 15);
}

/** The final avalanche of MurmurHash3 (fmix32, Appleby 2011): low bits depend on every bit. */
function finishHash(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return h ^ (h >>> 16);
}

function tuplesEqual(a: Float64Array, i: number, b: Float64Array, j: number, stride: number): boolean {
  for (let k = 0; k < stride; k++) if (a[i * stride + k] !== b[j * stride + k]) return false;
  return true;
}
