/**
 * Stable ordering of indices by Float64 keys with a least-significant-digit radix sort on the
 * IEEE-754 bits (11-bit digits, six passes, a pass skipped when all keys share its digit): O(n), no comparator calls, no pathological inputs.
 * A double maps to an unsigned 64-bit integer of the same order by flipping all bits of a
 * negative number and only the sign bit of a positive one (Terdiman 2000, "Radix sort
 * revisited"; common practice). Keys must not be NaN; −0 sorts just before 0.
 */

const DIGIT_BITS = 11;
const BUCKETS = 1 << DIGIT_BITS;
const DIGIT_MASK = BUCKETS - 1;

/**
 * Returns `indices` reordered so that keys[indices[i]] ascends, equal keys keeping their order
 * (so sorting by a secondary key first and then by the primary one sorts lexicographically).
 * `indices` itself is used as scratch; use the returned array.
 */
export function orderByKey(keys: Float64Array, indices: Uint32Array): Uint32Array {
  const n = indices.length;
  if (n < 2) return indices;
  const words = new Uint32Array(keys.buffer, keys.byteOffset, 2 * keys.length);
  let lo: Uint32Array = new Uint32Array(n);
  let hi: Uint32Array = new Uint32Array(n);
  let ids: Uint32Array = indices;
  for (let i = 0; i < n; i++) {
    const k = ids[i];
    const h = words[2 * k + 1]; // little-endian: the high word holds sign and exponent
    const negative = h >>> 31 === 1;
    lo[i] = negative ? ~words[2 * k] >>> 0 : words[2 * k];
    hi[i] = negative ? ~h >>> 0 : (h | 0x80000000) >>> 0;
  }
  // Each pass moves keys and indices together, so every pass reads its input in sequence.
  let lo2: Uint32Array = new Uint32Array(n);
  let hi2: Uint32Array = new Uint32Array(n);
  let ids2: Uint32Array = new Uint32Array(n);
  const counts = new Uint32Array(BUCKETS);
  for (let shift = 0; shift < 64; shift += DIGIT_BITS) {
    counts.fill(0);
    for (let i = 0; i < n; i++) counts[digit(lo[i], hi[i], shift)]++;
    if (counts[digit(lo[0], hi[0], shift)] === n) continue; // every key shares this digit
    for (let b = 0, sum = 0; b < BUCKETS; b++) {
      const c = counts[b];
      counts[b] = sum;
      sum += c;
    }
    for (let i = 0; i < n; i++) {
      const to = counts[digit(lo[i], hi[i], shift)]++;
      lo2[to] = lo[i];
      hi2[to] = hi[i];
      ids2[to] = ids[i];
    }
    [lo, lo2] = [lo2, lo];
    [hi, hi2] = [hi2, hi];
    [ids, ids2] = [ids2, ids];
  }
  return ids;
}

/** The 11-bit digit starting at bit `shift` of the 64-bit key hi:lo. */
function digit(lo: number, hi: number, shift: number): number {
  if (shift + DIGIT_BITS <= 32) return (lo >>> shift) & DIGIT_MASK;
  if (shift >= 32) return (hi >>> (shift - 32)) & DIGIT_MASK;
  return ((lo >>> shift) | (hi << (32 - shift))) & DIGIT_MASK;
}
