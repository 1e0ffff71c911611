// Placing 1,000,000 seeded rows that carry only present-day lat/lon + plate_id (uniform on the
// sphere, on the six plates of the demo pole table) in 100 slices of 3 Myr (0–300 Ma, as far as
// the demo model reaches): placeOccurrences with --rotate-at slice (target ≤ 1 s for the whole
// placement) and with --rotate-at occurrence (no target: these synthetic ages are all distinct,
// so the model builds one rotation per row, the worst case). References in the same process: a
// straightforward per-row version (the model asked per row, a rotation matrix and objects per
// row, Math.sin/cos/atan2), and gathering each slice's rows to call reconstructPointsInto once
// per slice.
// Run: npx tsx test/bench/placement.bench.ts (or `npm run bench placement`).
import { placeOccurrences } from '../../src/placement';
import { reconstructPointsInto, type RotationModel } from '../../src/rotation';
import type { OccurrenceTable } from '../../src/table';
import { assignSlices, equalBins, createSeededRandom, type SliceAssignment, type TimeScale } from '../../src/time';
import { demoModel, rotatePointNaively } from './rotation-fixtures';
import { report, time } from './measure';

const ROWS = 1_000_000;
const OLDEST_MA = 300;
const BIN_MYR = 3;
const SEED = 20250611;
const REPETITIONS = 10;
const WARM_UP = 3;
const DEG = 180 / Math.PI;

function presentDayTable(plates: readonly number[]): OccurrenceTable {
  const random = createSeededRandom(SEED);
  const lat = new Float64Array(ROWS), lon = new Float64Array(ROWS), plateId = new Int32Array(ROWS);
  const oldestMa = new Float64Array(ROWS), youngestMa = new Float64Array(ROWS);
  for (let i = 0; i < ROWS; i++) {
    lat[i] = Math.asin(2 * random.nextUniform() - 1) * DEG;
    lon[i] = random.nextUniform() * 360 - 180;
    plateId[i] = plates[Math.floor(random.nextUniform() * plates.length)];
    oldestMa[i] = random.nextUniform() * OLDEST_MA;
    youngestMa[i] = Math.max(0, oldestMa[i] - 5 * random.nextUniform());
  }
  const none = { codes: new Uint32Array(ROWS), values: ['x'] };
  return {
    count: ROWS, line: Uint32Array.from({ length: ROWS }, (_, i) => i + 2), taxon: none, collection: none, oldestMa, youngestMa,
    palaeoLat: new Float64Array(ROWS).fill(Number.NaN), palaeoLon: new Float64Array(ROWS).fill(Number.NaN), lat, lon, plateId,
  };
}

/** The obvious way: per row, ask the model, build the matrix, make objects, use Math. */
function reference(model: RotationModel, table: OccurrenceTable, assignment: SliceAssignment, scale: TimeScale, outLat: Float64Array, outLon: Float64Array): void {
  for (let i = 0; i < table.count; i++) {
    const s = assignment.slice[i];
    const moved = rotatePointNaively(model, table.plateId[i], 0.5 * (scale.baseMa[s] + scale.topMa[s]), table.lat[i], table.lon[i]);
    outLat[i] = moved.lat;
    outLon[i] = moved.lon;
  }
}

/** One reconstructPointsInto call per slice on the slice's rows, gathered and scattered back. */
function perSlice(model: RotationModel, table: OccurrenceTable, assignment: SliceAssignment, scale: TimeScale, outLat: Float64Array, outLon: Float64Array): void {
  const slices = scale.names.length;
  const start = new Int32Array(slices + 1);
  for (let i = 0; i < table.count; i++) start[assignment.slice[i] + 1]++;
  for (let s = 0; s < slices; s++) start[s + 1] += start[s];
  const order = new Int32Array(table.count), fill = start.slice(0, slices);
  for (let i = 0; i < table.count; i++) order[fill[assignment.slice[i]]++] = i;
  const lat = new Float64Array(table.count), lon = new Float64Array(table.count), plateId = new Int32Array(table.count);
  for (let k = 0; k < table.count; k++) {
    lat[k] = table.lat[order[k]];
    lon[k] = table.lon[order[k]];
    plateId[k] = table.plateId[order[k]];
  }
  const out = { lat: new Float64Array(table.count), lon: new Float64Array(table.count), status: new Uint8Array(table.count) };
  for (let s = 0; s < slices; s++) {
    const a = start[s], b = start[s + 1];
    reconstructPointsInto(model, { lat: lat.subarray(a, b), lon: lon.subarray(a, b), plateId: plateId.subarray(a, b) }, 0.5 * (scale.baseMa[s] + scale.topMa[s]),
      { lat: out.lat.subarray(a, b), lon: out.lon.subarray(a, b), status: out.status.subarray(a, b) });
  }
  for (let k = 0; k < table.count; k++) {
    outLat[order[k]] = out.lat[k];
    outLon[order[k]] = out.lon[k];
  }
}

export async function run(): Promise<void> {
  const model = demoModel();
  const table = presentDayTable(model.plateIds());
  const scale = equalBins(BIN_MYR, OLDEST_MA);
  const assignment = assignSlices(table.oldestMa, table.youngestMa, scale, { kind: 'mid-age' });
  const refLat = new Float64Array(ROWS), refLon = new Float64Array(ROWS);
  const bySlice = time(`placement, ${scale.names.length} slices, at slice mid-age`, () => placeOccurrences(table, assignment, scale, model, { rotateAt: 'slice', preferModel: false }), REPETITIONS, WARM_UP);
  const slow = time('per-row reference', () => reference(model, table, assignment, scale, refLat, refLon), 3, 1);
  report(bySlice, slow, '≤ 1000 ms');
  report(time('one reconstructPointsInto call per slice', () => perSlice(model, table, assignment, scale, refLat, refLon), REPETITIONS, WARM_UP));
  report(time("placement at each row's own age", () => placeOccurrences(table, assignment, scale, model, { rotateAt: 'occurrence', preferModel: false }), REPETITIONS, WARM_UP));
  const placed = placeOccurrences(table, assignment, scale, model, { rotateAt: 'slice', preferModel: false });
  let worst = 0;
  for (let i = 0; i < ROWS; i++) worst = Math.max(worst, Math.abs(placed.lat[i] - refLat[i]));
  console.log(`${''.padEnd(48)} largest latitude difference from the per-slice calls: ${worst.toExponential(1)}°`);
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
