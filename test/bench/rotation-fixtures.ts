// The demo scenario's rotation model (assets/demo/poles.csv) and a naive per-point rotation, for benchmarks.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRotationModel, poleTableFromRecords, type RotationModel } from '../../src/rotation';

export function demoModel(): RotationModel {
  const file = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'assets', 'demo', 'poles.csv');
  const [header, ...lines] = readFileSync(file, 'utf8').trimEnd().split('\n');
  return createRotationModel(poleTableFromRecords(header.split(','), lines.map((l, i) => ({ line: i + 2, fields: l.split(',') })), 'poles.csv'));
}

const DEG = 180 / Math.PI;

/**
 * The obvious way to rotate one point, the reference the rotation benchmarks compare against: ask
 * the model, build the rotation matrix, make objects, use Math functions.
 */
export function rotatePointNaively(model: RotationModel, plateId: number, ageMa: number, latDeg: number, lonDeg: number): { lat: number; lon: number } {
  const [w, x, y, z] = model.rotationAt(plateId, ageMa);
  const m = [
    [1 - 2 * (y * y + z * z), 2 * (x * y - w * z), 2 * (x * z + w * y)],
    [2 * (x * y + w * z), 1 - 2 * (x * x + z * z), 2 * (y * z - w * x)],
    [2 * (x * z - w * y), 2 * (y * z + w * x), 1 - 2 * (x * x + y * y)],
  ];
  const p = { phi: latDeg / DEG, lambda: lonDeg / DEG };
  const v = [Math.cos(p.phi) * Math.cos(p.lambda), Math.cos(p.phi) * Math.sin(p.lambda), Math.sin(p.phi)];
  const r = m.map((row) => row[0] * v[0] + row[1] * v[1] + row[2] * v[2]);
  return { lat: Math.atan2(r[2], Math.hypot(r[0], r[1])) * DEG, lon: Math.atan2(r[1], r[0]) * DEG };
}
