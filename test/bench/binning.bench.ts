// Assigning 1,000,000 seeded age ranges to the 102 chart stages with each rule: our binary-search
// kernels against a straightforward reference that scans every slice for every row, in the same
// process. Also checks that both give the same slices.
// Run: npx tsx test/bench/binning.bench.ts (or through `npm run bench`).
import {
  assignSlicesInto,
  chartScale,
  createSeededRandom,
  createSliceAssignment,
  type AssignRule,
  type TimeScale,
} from '../../src/time';
import { report, time } from './measure';

const ROWS = 1_000_000;
const SEED = 20240611;
const MEAN_RANGE_MYR = 5;
const POINT_SHARE = 0.05;
const WARM_UP = 2;
const REPETITIONS = 10;

/** Seeded ranges: max uniform over the Phanerozoic, length exponential (mean 5 Myr), 5% points. */
function makeRanges(reachMa: number): { oldestMa: Float64Array; youngestMa: Float64Array } {
  const random = createSeededRandom(SEED);
  const oldestMa = new Float64Array(ROWS);
  const youngestMa = new Float64Array(ROWS);
  for (let r = 0; r < ROWS; r++) {
    oldestMa[r] = random.nextUniform() * reachMa;
    const length = random.nextUniform() < POINT_SHARE ? 0 : -MEAN_RANGE_MYR * Math.log(1 - random.nextUniform());
    youngestMa[r] = Math.max(0, oldestMa[r] - length);
  }
  return { oldestMa, youngestMa };
}

function linearSlice(scale: TimeScale, age: number): number {
  const last = scale.names.length - 1;
  for (let i = 0; i <= last; i++) {
    if ((age > scale.topMa[i] && age <= scale.baseMa[i]) || (age === 0 && i === last && scale.topMa[i] === 0)) return i;
  }
  return -1;
}

function linearContaining(scale: TimeScale, lo: number, hi: number): number {
  for (let i = 0; i < scale.names.length; i++) if (scale.topMa[i] <= lo && hi <= scale.baseMa[i]) return i;
  return -1;
}

function linearLargestShare(scale: TimeScale, lo: number, hi: number, fraction: number): number {
  let best = -1;
  let bestLength = 0;
  for (let i = 0; i < scale.names.length; i++) {
    const length = Math.min(hi, scale.baseMa[i]) - Math.max(lo, scale.topMa[i]);
    if (length > 0 && length >= bestLength) {
      bestLength = length;
      best = i;
    }
  }
  return best >= 0 && bestLength / (hi - lo) >= fraction ? best : -1;
}

/** The reference: every rule written as a scan over all slices per row. */
function reference(oldestMa: Float64Array, youngestMa: Float64Array, scale: TimeScale, rule: AssignRule, out: Int32Array): void {
  const random = rule.kind === 'draw' ? createSeededRandom(rule.seed) : undefined;
  for (let r = 0; r < oldestMa.length; r++) {
    const hi = oldestMa[r];
    const lo = youngestMa[r];
    if (random !== undefined) out[r] = linearSlice(scale, Math.min(hi, lo + random.nextUniform() * (hi - lo)));
    else if (rule.kind === 'mid-age' || hi === lo) out[r] = linearSlice(scale, rule.kind === 'mid-age' ? 0.5 * (hi + lo) : lo);
    else if (rule.kind === 'whole-range') out[r] = linearContaining(scale, lo, hi);
    else if (rule.kind === 'share') out[r] = linearLargestShare(scale, lo, hi, rule.fraction);
  }
}

export async function run(): Promise<void> {
  const stages = chartScale('stages');
  const { oldestMa, youngestMa } = makeRanges(stages.baseMa[0]);
  const ours = createSliceAssignment(ROWS);
  const theirs = new Int32Array(ROWS);
  const rules: readonly AssignRule[] = [
    { kind: 'mid-age' },
    { kind: 'whole-range' },
    { kind: 'share', fraction: 0.5 },
    { kind: 'draw', seed: SEED },
  ];
  console.log(`binning: ${ROWS.toLocaleString('en')} seeded age ranges onto ${stages.names.length} chart stages`);
  for (const rule of rules) {
    const name = rule.kind === 'share' ? `share:${rule.fraction}` : rule.kind;
    const fast = time(`${name}: binary search (assignSlicesInto)`, () => assignSlicesInto(oldestMa, youngestMa, stages, rule, ours), REPETITIONS, WARM_UP);
    const slow = time(`${name}: reference, linear scan per row`, () => reference(oldestMa, youngestMa, stages, rule, theirs), REPETITIONS, WARM_UP);
    report(fast, slow, 'a few tens of ms');
    let differ = 0;
    for (let r = 0; r < ROWS; r++) if (ours.slice[r] !== theirs[r]) differ++;
    console.log(`${''.padEnd(48)} rows assigned differently from the reference: ${differ}`);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
