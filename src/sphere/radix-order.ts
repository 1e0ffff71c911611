/**
 * Stable orderings of indices by numeric keys with least-significant-digit radix sorts: O(n), no
 * comparator calls, no pathological inputs. The digit width suits the number of keys (moving a
 * key costs about as much as clearing and summing a few buckets), one counting pass
 * finds the histograms of all digits, and a digit that all keys share costs no pass. Short
 * ranges are sorted by insertion instead, cheaper than clearing histograms.
 */

/**
 * A new array of the `indices` reordered so that keys[indices[i]] ascends, equal keys keeping
 * their order (so sorting by a secondary key first and then by the primary one sorts
 * lexicographically). Keys must not be NaN; −0 sorts just before 0.
 */
export function orderByKey(keys: Float64Array, indices: Uint32Array): Uint32Array {
  const n = indices.length;
  if (n < 2) return indices;
  // A double maps to an unsigned 64-bit integer hi:lo of the same order by flipping all bits of
  // a negative number and only the sign bit of a positive one (Terdiman 2000, "Radix sort
  // revisited"; common practice).
  const words = new Uint32Array(keys.buffer, keys.byteOffset, 2 * keys.length);
  const scratch = new Uint32Array(6 * n); // one allocation for six working arrays
  const [lo, hi, position, spareKeys, spare, low] = [0, 1, 2, 3, 4, 5].map((k) => scratch.subarray(k * n, (k + 1) * n));
  for (let i = 0; i < n; i++) {
    const k = indices[i];
    const h = words[2 * k + 1]; // little-endian: the high word holds sign and exponent
    const negative = h >>> 31 === 1;
    lo[i] = negative ? ~words[2 * k] >>> 0 : words[2 * k];
    hi[i] = negative ? ~h >>> 0 : (h | 0x80000000) >>> 0;
    position[i] = i;
  }
  // By the high word (sign, exponent and 20 bits of mantissa), then each run of equal high words
  // by the low word: keys mostly differ in the high word already, so runs are few and short.
  sortByWord(hi, position, 0, n, 32, spareKeys, spare);
  const out = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    out[i] = indices[position[i]];
    low[i] = lo[position[i]];
  }
  for (let i = 0, j = 1; i < n; i = j++) {
    while (j < n && hi[j] === hi[i]) j++;
    if (j - i > 1) sortByWord(low, out, i, j, 32, spareKeys, spare);
  }
  return out;
}

/**
 * Reorders `indices` in place so that the low `bits` bits of `keys` (one per item, in the same
 * order, reordered alike) ascend, equal keys keeping their order; returns `indices`.
 */
export function orderByBits(keys: Uint32Array, indices: Uint32Array, bits: number): Uint32Array {
  const n = keys.length;
  const spare = new Uint32Array(2 * n);
  sortByWord(keys, indices, 0, n, bits, spare.subarray(0, n), spare.subarray(n));
  return indices;
}

const MAX_DIGIT_BITS = 16;
const INSERTION_BELOW = 24;

/**
 * Stable sort, in place, of items begin..end−1 of `keys` (by their low `bits` bits) and
 * `payload` alike; the spare arrays are scratch of the same length.
 */
function sortByWord(
  keys: Uint32Array, payload: Uint32Array, begin: number, end: number, bits: number,
  spareKeys: Uint32Array, spare: Uint32Array,
): void {
  const n = end - begin;
  const mask = bits >= 32 ? 0xffffffff : (1 << bits) - 1;
  if (n < INSERTION_BELOW) {
    for (let i = begin + 1; i < end; i++) {
      const key = keys[i], item = payload[i], k = (key & mask) >>> 0;
      let j = i - 1;
      for (; j >= begin && ((keys[j] & mask) >>> 0) > k; j--) {
        keys[j + 1] = keys[j];
        payload[j + 1] = payload[j];
      }
      keys[j + 1] = key;
      payload[j + 1] = item;
    }
    return;
  }
  let passes = Math.ceil(bits / MAX_DIGIT_BITS);
  const cost = (p: number) => p * (8 * n + 2 ** Math.ceil(bits / p));
  while (passes < bits && cost(passes + 1) < cost(passes)) passes++;
  const width = Math.ceil(bits / passes), buckets = 1 << width, digit = buckets - 1;
  const counts = new Uint32Array(passes * buckets);
  for (let i = begin; i < end; i++) {
    const key = keys[i];
    for (let p = 0, shift = 0; p < passes; p++, shift += width) counts[p * buckets + ((key >>> shift) & digit)]++;
  }
  let fromKeys = keys, from = payload, toKeys = spareKeys, to = spare;
  for (let p = 0, shift = 0; p < passes; p++, shift += width) {
    const base = p * buckets;
    if (counts[base + ((fromKeys[begin] >>> shift) & digit)] === n) continue; // every key shares this digit
    for (let b = base, sum = begin; b < base + buckets; b++) {
      const c = counts[b];
      counts[b] = sum;
      sum += c;
    }
    for (let i = begin; i < end; i++) {
      const key = fromKeys[i];
      const at = counts[base + ((key >>> shift) & digit)]++;
      toKeys[at] = key;
      to[at] = from[i];
    }
    const swapKeys = fromKeys;
    fromKeys = toKeys;
    toKeys = swapKeys;
    const swap = from;
    from = to;
    to = swap;
  }
  if (from !== payload) {
    keys.set(fromKeys.subarray(begin, end), begin);
    payload.set(from.subarray(begin, end), begin);
  }
}
