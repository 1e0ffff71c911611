/**
 * Binary searches over a time scale's boundaries (bases and tops both decrease with the slice
 * index). Slice i holds top_i < age <= base_i: an age on a boundary belongs to the younger slice,
 * whose base it is. Gaps between slices are allowed.
 */

// The searches keep `first` (entries before it pass the test) and `len` (entries still unknown)
// and update both with selects rather than branches: on scattered ages a branchy search
// mispredicts at almost every step.

/** Number of leading slices whose boundary is >= x (bounds decreasing). */
function countAtLeast(bounds: Float64Array, x: number): number {
  let first = 0;
  let len = bounds.length;
  while (len > 0) {
    const half = len >>> 1;
    const pass = bounds[first + half] >= x;
    first = pass ? first + half + 1 : first;
    len = pass ? len - half - 1 : half;
  }
  return first;
}

/** Number of leading slices whose boundary is > x (bounds decreasing). */
function countAbove(bounds: Float64Array, x: number): number {
  let first = 0;
  let len = bounds.length;
  while (len > 0) {
    const half = len >>> 1;
    const pass = bounds[first + half] > x;
    first = pass ? first + half + 1 : first;
    len = pass ? len - half - 1 : half;
  }
  return first;
}

/**
 * Slice holding the age (Ma), or -1 if it falls outside the scale or in a gap. An age of 0 goes to
 * the youngest slice when that slice's top is 0.
 */
export function sliceOfAge(baseMa: Float64Array, topMa: Float64Array, ageMa: number): number {
  // The youngest slice whose base is at or above the age is the only candidate.
  const i = countAtLeast(baseMa, ageMa) - 1;
  if (i < 0) return -1;
  if (ageMa > topMa[i]) return i;
  if (ageMa === 0 && topMa[i] === 0 && i === baseMa.length - 1) return i;
  return -1;
}

/** First slice whose top is younger than x Ma: no older slice reaches below x. */
export function firstSliceEndingBelow(topMa: Float64Array, x: number): number {
  return countAtLeast(topMa, x);
}

/** Last slice whose base is older than x Ma: no younger slice reaches above x (-1 if none). */
export function lastSliceStartingAbove(baseMa: Float64Array, x: number): number {
  return countAbove(baseMa, x) - 1;
}
