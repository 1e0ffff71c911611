import { EXCLUSION_CODE, NOT_EXCLUDED } from '../problems';
import { createSeededRandom } from './seeded-random';
import { firstSliceEndingBelow, lastSliceStartingAbove, sliceOfAge } from './slice-lookup';
import type { AssignRule, SliceAssignment, TimeScale } from './time-scale';

/** Empty output columns for `count` rows, for assignSlicesInto. */
export function createSliceAssignment(count: number): SliceAssignment {
  return { slice: new Int32Array(count), reason: new Uint8Array(count), age: new Float64Array(count) };
}

function assign(out: SliceAssignment, row: number, slice: number, ageMa: number): void {
  out.slice[row] = slice;
  out.reason[row] = NOT_EXCLUDED;
  out.age[row] = ageMa;
}

function reject(out: SliceAssignment, row: number, reason: number): void {
  out.slice[row] = -1;
  out.reason[row] = reason;
  out.age[row] = Number.NaN;
}

function assignPoint(out: SliceAssignment, row: number, scale: TimeScale, ageMa: number): void {
  const s = sliceOfAge(scale.baseMa, scale.topMa, ageMa);
  if (s < 0) reject(out, row, EXCLUSION_CODE.ageOutside);
  else assign(out, row, s, ageMa);
}

function midAgeRule(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, out: SliceAssignment): void {
  for (let r = 0; r < oldestMa.length; r++) assignPoint(out, r, scale, 0.5 * (oldestMa[r] + youngestMa[r]));
}

function drawRule(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, seed: number, out: SliceAssignment): void {
  const random = createSeededRandom(seed);
  for (let r = 0; r < oldestMa.length; r++) {
    // One draw per row, point ages included, so row r's draw depends only on the seed and r.
    const age = youngestMa[r] + random.nextUniform() * (oldestMa[r] - youngestMa[r]);
    assignPoint(out, r, scale, Math.min(age, oldestMa[r]));
  }
}

/** True if slices first..last leave a gap between neighbours. */
function hasGap(scale: TimeScale, first: number, last: number): boolean {
  for (let i = first; i < last; i++) if (scale.topMa[i] !== scale.baseMa[i + 1]) return true;
  return false;
}

function wholeRangeRule(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, out: SliceAssignment): void {
  const { baseMa, topMa } = scale;
  for (let r = 0; r < oldestMa.length; r++) {
    const hi = oldestMa[r];
    const lo = youngestMa[r];
    if (hi === lo) {
      assignPoint(out, r, scale, lo);
      continue;
    }
    const a = firstSliceEndingBelow(topMa, hi);
    const b = lastSliceStartingAbove(baseMa, lo);
    if (a > b) reject(out, r, EXCLUSION_CODE.ageOutside);
    else if (a === b && topMa[a] <= lo && hi <= baseMa[a]) assign(out, r, a, 0.5 * (hi + lo));
    else if (hi > baseMa[a] || lo < topMa[b] || hasGap(scale, a, b)) reject(out, r, EXCLUSION_CODE.ageOutside);
    else reject(out, r, EXCLUSION_CODE.spansSlices);
  }
}

function shareRule(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, fraction: number, out: SliceAssignment): void {
  const { baseMa, topMa } = scale;
  for (let r = 0; r < oldestMa.length; r++) {
    const hi = oldestMa[r];
    const lo = youngestMa[r];
    if (hi === lo) {
      assignPoint(out, r, scale, lo); // a point age is wholly (share 1) in its slice
      continue;
    }
    const a = firstSliceEndingBelow(topMa, hi);
    const b = lastSliceStartingAbove(baseMa, lo);
    if (a > b) {
      reject(out, r, EXCLUSION_CODE.ageOutside);
      continue;
    }
    let best = -1;
    let bestLength = 0;
    for (let i = a; i <= b; i++) {
      const length = Math.min(hi, baseMa[i]) - Math.max(lo, topMa[i]);
      // >= so that on a tie the younger slice wins, as the mid-age rule would decide.
      if (length >= bestLength) {
        bestLength = length;
        best = i;
      }
    }
    if (bestLength / (hi - lo) >= fraction) assign(out, r, best, 0.5 * (hi + lo));
    else reject(out, r, EXCLUSION_CODE.shareTooSmall);
  }
}

/**
 * Gives each occurrence (age range youngestMa..oldestMa, Ma, oldest >= youngest >= 0) at most one
 * slice of the scale, writing into `out` (no allocation). Slice i holds top < age <= base; age 0
 * goes to the youngest slice when its top is 0. A range with oldest == youngest is treated as a
 * point age by every rule.
 *
 * - `mid-age`: the slice holding (oldest + youngest) / 2.
 * - `whole-range`: the slice that holds the whole range. Containment is closed at both ends for a range
 *   of positive length (top <= youngest and oldest <= base): its end points carry no weight, so a range
 *   that is exactly a stage lies in that stage. Otherwise ageOutside if part of the range lies
 *   outside every slice (beyond the scale or in a gap), else spansSlices.
 * - `share:F`: the slice holding the largest share of the range's length, if that share is at
 *   least F; ties go to the younger slice (agreeing with the mid-age rule, since a range split
 *   evenly across a boundary has its mid-age on that boundary). The share counts the whole range,
 *   parts outside the scale included. ageOutside if no slice overlaps, else shareTooSmall.
 * - `draw`: one seeded uniform draw in [youngest, oldest] per row, in row order (Mulberry32).
 *
 * `out.age` is the mid-age for mid-age, whole-range and share, the draw for draw; NaN when
 * unassigned. Inputs are trusted (validated where the table is read).
 */
export function assignSlicesInto(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, rule: AssignRule, out: SliceAssignment): SliceAssignment {
  const n = oldestMa.length;
  if (youngestMa.length !== n || out.slice.length !== n || out.reason.length !== n || out.age.length !== n) {
    throw new RangeError(`Column lengths differ: oldestMa ${n}, youngestMa ${youngestMa.length}, out ${out.slice.length}/${out.reason.length}/${out.age.length}.`);
  }
  switch (rule.kind) {
    case 'mid-age':
      midAgeRule(oldestMa, youngestMa, scale, out);
      break;
    case 'whole-range':
      wholeRangeRule(oldestMa, youngestMa, scale, out);
      break;
    case 'share':
      shareRule(oldestMa, youngestMa, scale, rule.fraction, out);
      break;
    case 'draw':
      drawRule(oldestMa, youngestMa, scale, rule.seed, out);
      break;
  }
  return out;
}

/** As assignSlicesInto, into new columns. */
export function assignSlices(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, rule: AssignRule): SliceAssignment {
  return assignSlicesInto(oldestMa, youngestMa, scale, rule, createSliceAssignment(oldestMa.length));
}
