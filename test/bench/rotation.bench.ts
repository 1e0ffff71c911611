// Reconstructing 1,000,000 seeded present-day points (uniform on the sphere, on the six plates of
// the demo pole table, chains up to three links deep): all to one age (target ≤ 50 ms), and a
// 100-slice reconstruction with each row at its slice's mid age (target ≤ 1 s), against a
// straightforward per-point version in the same process (the model asked per point, a rotation
// matrix built per point, an object per point, Math.sin/cos/atan2).
// Run: npx tsx test/bench/rotation.bench.ts (or `npm run bench rotation`).
import { reconstructPointsInto, type RotationModel } from '../../src/rotation';
import { createSeededRandom } from '../../src/time/seeded-random';
import { demoModel, rotatePointNaively } from './rotation-fixtures';
import { report, time } from './measure';

const POINTS = 1_000_000;
const SLICES = 100;
const OLDEST_MA = 300;
const ONE_AGE_MA = 150;
const SEED = 20250417;
const REPETITIONS = 10;
const WARM_UP = 3;
const DEG = 180 / Math.PI;

function points(plates: readonly number[]): { lat: Float64Array; lon: Float64Array; plateId: Int32Array; sliceAge: Float64Array } {
  const random = createSeededRandom(SEED);
  const lat = new Float64Array(POINTS), lon = new Float64Array(POINTS), plateId = new Int32Array(POINTS), sliceAge = new Float64Array(POINTS);
  const width = OLDEST_MA / SLICES;
  for (let i = 0; i < POINTS; i++) {
    lat[i] = Math.asin(2 * random.nextUniform() - 1) * DEG;
    lon[i] = random.nextUniform() * 360 - 180;
    plateId[i] = plates[Math.floor(random.nextUniform() * plates.length)];
    sliceAge[i] = (Math.floor(random.nextUniform() * SLICES) + 0.5) * width;
  }
  return { lat, lon, plateId, sliceAge };
}

/** The obvious way: per point, ask the model, build the matrix, make objects, use Math. */
function reference(model: RotationModel, rows: ReturnType<typeof points>, ages: Float64Array | number, outLat: Float64Array, outLon: Float64Array): void {
  for (let i = 0; i < POINTS; i++) {
    const moved = rotatePointNaively(model, rows.plateId[i], typeof ages === 'number' ? ages : ages[i], rows.lat[i], rows.lon[i]);
    outLat[i] = moved.lat;
    outLon[i] = moved.lon;
  }
}

/** Largest angle (degrees) between the two results, as a check that both did the same work. */
function largestDifference(aLat: Float64Array, aLon: Float64Array, bLat: Float64Array, bLon: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < aLat.length; i++) {
    const p1 = aLat[i] / DEG, p2 = bLat[i] / DEG, dl = (aLon[i] - bLon[i]) / DEG;
    const c = Math.sin(p1) * Math.sin(p2) + Math.cos(p1) * Math.cos(p2) * Math.cos(dl);
    const s = Math.hypot(Math.cos(p2) * Math.sin(dl), Math.cos(p1) * Math.sin(p2) - Math.sin(p1) * Math.cos(p2) * Math.cos(dl));
    worst = Math.max(worst, Math.atan2(s, c) * DEG);
  }
  return worst;
}

function compare(label: string, model: RotationModel, rows: ReturnType<typeof points>, ages: Float64Array | number, target: string): void {
  const out = { lat: new Float64Array(POINTS), lon: new Float64Array(POINTS), status: new Uint8Array(POINTS) };
  const refLat = new Float64Array(POINTS), refLon = new Float64Array(POINTS);
  const fast = time(`${label}, ${POINTS} points`, () => reconstructPointsInto(model, rows, ages, out), REPETITIONS, WARM_UP);
  const slow = time(`${label}, per-point reference`, () => reference(model, rows, ages, refLat, refLon), 5, 1);
  report(fast, slow, target);
  console.log(`${''.padEnd(48)} largest difference from the reference: ${largestDifference(out.lat, out.lon, refLat, refLon).toExponential(1)}°`);
}

export async function run(): Promise<void> {
  const model = demoModel();
  const rows = points(model.plateIds());
  compare(`one age (${ONE_AGE_MA} Ma)`, model, rows, ONE_AGE_MA, '≤ 50 ms');
  compare(`${SLICES} slices, each row at its slice's mid age`, model, rows, rows.sliceAge, '≤ 1000 ms');
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
