import { describe, expect, it } from 'vitest';
import {
  BEYOND_MODEL, ROTATION_STATUS, createRotationModel, poleTableFromRecords,
  reconstructPointsInto, type BeyondModel, type PresentDayPoints, type ReconstructedPoints, type RotationModel,
} from '../../src/rotation';
import { createSeededRandom } from '../../src/time/seeded-random';
import { columns, demoCsv, demoText } from '../demo/demo-files';
// Independent reference: Rodrigues rotation matrices (./rodrigues), composed and interpolated
// along the SO(3) geodesic without quaternions.
import { angleBetweenDeg, apply, geodesicBetween, matMul, poleMatrix, unit, type Mat3 } from './rodrigues';
import { TEST_POLE_HEADER } from './pole-rows';

const LINES = ['101,0,90,0,0,0', '101,100,20,30,40,0', '101,200,-10,60,65,0', '601,0,90,0,0,101', '601,150,45,-120,-30,101'];

function modelOf(lines: readonly string[], beyond: BeyondModel = BEYOND_MODEL.reject): RotationModel {
  const records = lines.map((l, i) => ({ line: i + 2, fields: l.split(',') }));
  return createRotationModel(poleTableFromRecords(TEST_POLE_HEADER, records, 'poles.csv'), { beyond });
}

/** Total rotation matrix of plate 101 or 601 at an age, from the rows of LINES, by matrices only. */
function referenceMatrix(plate: number, age: number): Mat3 {
  const link = (rows: Array<[number, number, number, number]>, t: number): Mat3 => {
    const k = Math.max(1, rows.findIndex(([a]) => a >= t));
    const [a0, ...p0] = rows[k - 1], [a1, ...p1] = rows[k];
    return geodesicBetween(poleMatrix(...p0), poleMatrix(...p1), (t - a0) / (a1 - a0));
  };
  const m101 = link([[0, 90, 0, 0], [100, 20, 30, 40], [200, -10, 60, 65]], age);
  return plate === 101 ? m101 : matMul(m101, link([[0, 90, 0, 0], [150, 45, -120, -30]], age));
}

/** reconstructPointsInto into new columns. */
function reconstructed(model: RotationModel, points: PresentDayPoints, ages: Float64Array | number): ReconstructedPoints {
  const n = points.lat.length;
  return reconstructPointsInto(model, points, ages, { lat: new Float64Array(n), lon: new Float64Array(n), status: new Uint8Array(n) });
}

function at(out: { lat: Float64Array; lon: Float64Array }, i: number): [number, number, number] {
  return unit(out.lat[i], out.lon[i]);
}

describe('reconstructing columns of points', () => {
  it('turns every row as the matrix reference does, one age per row, across chunks and many (plate, age) groups', () => {
    const n = 5000, random = createSeededRandom(11);
    const lat = new Float64Array(n), lon = new Float64Array(n), plateId = new Int32Array(n), ages = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      lat[i] = Math.asin(2 * random.nextUniform() - 1) / (Math.PI / 180);
      lon[i] = 360 * random.nextUniform() - 180;
      plateId[i] = random.nextUniform() < 0.5 ? 101 : 601;
      ages[i] = 0.5 * Math.floor(300 * random.nextUniform()); // 300 distinct ages: groups outgrow the first tables
    }
    const out = reconstructed(modelOf(LINES), { lat, lon, plateId }, ages);
    for (let i = 0; i < n; i++) {
      expect(out.status[i]).toBe(ROTATION_STATUS.ok);
      const expected = apply(referenceMatrix(plateId[i], ages[i]), unit(lat[i], lon[i]));
      if (!(angleBetweenDeg(at(out, i), expected) < 1e-9)) expect.fail(`row ${i}: ${angleBetweenDeg(at(out, i), expected)}° off`);
    }
  });

  it('gives one age for all the same result as that age on every row', () => {
    const lat = Float64Array.of(10, -20, 89.9, -90), lon = Float64Array.of(0, 179.5, -180, 30), plateId = Int32Array.of(601, 101, 601, 101);
    const model = modelOf(LINES);
    const one = reconstructed(model, { lat, lon, plateId }, 123.4);
    const each = reconstructed(model, { lat, lon, plateId }, new Float64Array(4).fill(123.4));
    expect(Array.from(one.lat)).toEqual(Array.from(each.lat));
    expect(Array.from(one.lon)).toEqual(Array.from(each.lon));
  });

  it('leaves points of the fixed plate and points at 0 Ma where they are', () => {
    const lat = Float64Array.of(12.5, -45), lon = Float64Array.of(-170, 60);
    const fixed = reconstructed(modelOf(LINES), { lat, lon, plateId: Int32Array.of(0, 0) }, 150);
    const today = reconstructed(modelOf(LINES), { lat, lon, plateId: Int32Array.of(601, 101) }, 0);
    for (const out of [fixed, today]) {
      for (let i = 0; i < 2; i++) expect(angleBetweenDeg(at(out, i), unit(lat[i], lon[i]))).toBeLessThan(1e-12);
    }
  });

  it.each([
    ['no plate id', -1, 10, 20, 50, ROTATION_STATUS.noPlateId],
    ['no latitude', 101, Number.NaN, 20, 50, ROTATION_STATUS.noPosition],
    ['a latitude beyond the pole', 101, 90.5, 20, 50, ROTATION_STATUS.noPosition],
    ['a longitude beyond 180°', 101, 10, 180.5, 50, ROTATION_STATUS.noPosition],
    ['no age', 101, 10, 20, Number.NaN, ROTATION_STATUS.noAge],
    ['a negative age', 101, 10, 20, -1, ROTATION_STATUS.noAge],
    ['a plate not in the model', 999, 10, 20, 50, ROTATION_STATUS.plateNotInModel],
    ['an age older than the plate’s chain reaches', 601, 10, 20, 160, ROTATION_STATUS.beyondModel],
  ])('keeps a row with %s, with NaN and a status saying why', (_what, plate, la, lo, age, status) => {
    const rows = { lat: Float64Array.of(5, la), lon: Float64Array.of(5, lo), plateId: Int32Array.of(101, plate) };
    const out = reconstructed(modelOf(LINES), rows, Float64Array.of(50, age));
    expect(Array.from(out.status)).toEqual([ROTATION_STATUS.ok, status]);
    expect(out.lat[1]).toBeNaN();
    expect(out.lon[1]).toBeNaN();
    expect(out.lat[0]).not.toBeNaN();
  });

  it('reconstructs an older age at the oldest age reached when the model clamps, and marks the row', () => {
    const rows = { lat: Float64Array.of(5), lon: Float64Array.of(6), plateId: Int32Array.of(601) };
    const out = reconstructed(modelOf(LINES, BEYOND_MODEL.clamp), rows, 190);
    expect(out.status[0]).toBe(ROTATION_STATUS.clamped);
    expect(angleBetweenDeg(at(out, 0), apply(referenceMatrix(601, 150), unit(5, 6)))).toBeLessThan(1e-9);
  });

  it('refuses columns of different lengths and outputs that are too short', () => {
    const model = modelOf(LINES);
    const rows = { lat: new Float64Array(3), lon: new Float64Array(3), plateId: new Int32Array(2) };
    expect(() => reconstructed(model, rows, 10)).toThrow('Columns of different lengths: lat 3, lon 3, plateId 2.');
    const ok = { lat: new Float64Array(3), lon: new Float64Array(3), plateId: new Int32Array(3) };
    expect(() => reconstructed(model, ok, new Float64Array(2))).toThrow('Columns of different lengths: lat 3, lon 3, plateId 3, ages 2.');
    expect(() => reconstructPointsInto(model, ok, 10, { lat: new Float64Array(3), lon: new Float64Array(2), status: new Uint8Array(3) })).toThrow(RangeError);
  });
});

describe('the demo scenario', () => {
  it('reproduces every palaeoposition of occurrences.csv to 1e-3° from its present-day position at the age midpoint', () => {
    // The demo's palaeo columns were written from unrounded positions, each rounded to 1e-4°
    // (assets/demo/README.md), so 1e-3° bounds the rounding of both columns.
    const [header, ...lines] = demoText('poles.csv').trimEnd().split('\n');
    const model = createRotationModel(poleTableFromRecords(header.split(','), lines.map((l, i) => ({ line: i + 2, fields: l.split(',') })), 'poles.csv'));
    const occ = demoCsv('occurrences.csv'), c = columns(occ.header);
    const n = occ.rows.length;
    const col = (name: string) => Float64Array.from(occ.rows, (r) => Number(r[c[name]]));
    const ages = Float64Array.from(occ.rows, (r) => (Number(r[c.oldest_ma]) + Number(r[c.youngest_ma])) / 2);
    const out = reconstructed(model, { lat: col('lat'), lon: col('lon'), plateId: Int32Array.from(occ.rows, (r) => Number(r[c.plate_id])) }, ages);
    const palaeoLat = col('palaeo_lat'), palaeoLon = col('palaeo_lon');
    let worst = 0;
    for (let i = 0; i < n; i++) {
      expect(out.status[i]).toBe(ROTATION_STATUS.ok);
      worst = Math.max(worst, angleBetweenDeg(at(out, i), unit(palaeoLat[i], palaeoLon[i])));
    }
    expect(n).toBeGreaterThan(45_000);
    expect(worst).toBeLessThan(1e-3);
  });
});
