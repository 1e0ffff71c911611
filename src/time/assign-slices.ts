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

function midpointRule(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, out: SliceAssignment): void {
  for (let r = 0; r < maxMa.length; r++) assignPoint(out, r, scale, 0.5 * (maxMa[r] + minMa[r]));
}

function randomRule(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, seed: number, out: SliceAssignment): void {
  const random = createSeededRandom(seed);
  for (let r = 0; r < maxMa.length; r++) {
    // One draw per row, point ages included, so row r's draw depends only on the seed and r.
    const age = minMa[r] + random.nextUniform() * (maxMa[r] - minMa[r]);
    assignPoint(out, r, scale, Math.min(age, maxMa[r]));
  }
}

/** True if slices first..last leave a gap between neighbours. */
function hasGap(scale: TimeScale, first: number, last: number): boolean {
  for (let i = first; i < last; i++) if (scale.topMa[i] !== scale.baseMa[i + 1]) return true;
  return false;
}

function withinRule(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, out: SliceAssignment): void {
  const { baseMa, topMa } = scale;
  for (let r = 0; r < maxMa.length; r++) {
    const hi = maxMa[r];
    const lo = minMa[r];
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

function overlapRule(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, fraction: number, out: SliceAssignment): void {
  const { baseMa, topMa } = scale;
  for (let r = 0; r < maxMa.length; r++) {
    const hi = maxMa[r];
    const lo = minMa[r];
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
      // >= so that on a tie the younger slice wins, as the midpoint rule would decide.
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
 * Gives each occurrence (age range minMa..maxMa, Ma, max >= min >= 0) at most one slice of the
 * scale, writing into `out` (no allocation). Slice i holds top < age <= base; age 0 goes to the
 * youngest slice when its top is 0. A range with max == min is treated as a point age by every rule.
 *
 * - `midpoint`: the slice holding (max + min) / 2.
 * - `within`: the slice that holds the whole range. Containment is closed at both ends for a range
 *   of positive length (top <= min and max <= base): its end points carry no weight, so a range
 *   that is exactly a stage lies in that stage. Otherwise ageOutside if part of the range lies
 *   outside every slice (beyond the scale or in a gap), else spansSlices.
 * - `overlap:F`: the slice holding the largest share of the range's length, if that share is at
 *   least F; ties go to the younger slice (agreeing with the midpoint rule, since a range split
 *   evenly across a boundary has its midpoint on that boundary). The share counts the whole range,
 *   parts outside the scale included. ageOutside if no slice overlaps, else shareTooSmall.
 * - `random`: one seeded uniform draw in [min, max] per row, in row order (Mulberry32).
 *
 * `out.age` is the midpoint for midpoint, within and overlap, the draw for random; NaN when
 * unassigned. Inputs are trusted (validated where the table is read).
 */
export function assignSlicesInto(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, rule: AssignRule, out: SliceAssignment): SliceAssignment {
  const n = maxMa.length;
  if (minMa.length !== n || out.slice.length !== n || out.reason.length !== n || out.age.length !== n) {
    throw new RangeError(`Column lengths differ: maxMa ${n}, minMa ${minMa.length}, out ${out.slice.length}/${out.reason.length}/${out.age.length}.`);
  }
  switch (rule.kind) {
    case 'midpoint':
      midpointRule(maxMa, minMa, scale, out);
      break;
    case 'within':
      withinRule(maxMa, minMa, scale, out);
      break;
    case 'overlap':
      overlapRule(maxMa, minMa, scale, rule.fraction, out);
      break;
    case 'random':
      randomRule(maxMa, minMa, scale, rule.seed, out);
      break;
  }
  return out;
}

/** As assignSlicesInto, into new columns. */
export function assignSlices(maxMa: Float64Array, minMa: Float64Array, scale: TimeScale, rule: AssignRule): SliceAssignment {
  return assignSlicesInto(maxMa, minMa, scale, rule, createSliceAssignment(maxMa.length));
}
