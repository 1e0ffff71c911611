// The demo scenario's rotation model (assets/demo/poles.csv), for benchmarks.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRotationModel, poleTableFromRecords, type RotationModel } from '../../src/rotation';

export function demoModel(): RotationModel {
  const file = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'assets', 'demo', 'poles.csv');
  const [header, ...lines] = readFileSync(file, 'utf8').trimEnd().split('\n');
  return createRotationModel(poleTableFromRecords(header.split(','), lines.map((l, i) => ({ line: i + 2, fields: l.split(',') })), 'poles.csv'));
}
