// A seeded synthetic occurrence table for benchmarks: collections of a few occurrences that share
// an age range and a palaeoposition (as real compilations do), ages over the Phanerozoic so that
// the chart's stages give about 100 slices, sites clustered around a few hundred centres.
import { createWriteStream, existsSync, renameSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createSeededRandom } from '../../src/time';

const FORMAT_VERSION = 1;
const OLDEST_MA = 538;

/**
 * Path of the cached table with `rows` rows for `seed`, written on first use. With `plates`,
 * each collection gets one of those plate ids and the positions are present-day ones (`lat`,
 * `lon`, `plate_id`) for a rotation model to place, instead of `palaeo_lat`, `palaeo_lon`.
 */
export async function syntheticTable(rows: number, seed = 7, plates?: readonly number[]): Promise<string> {
  const kind = plates === undefined ? '' : `-plates${plates.join('_')}`;
  const path = join(tmpdir(), `driftgrid-bench-${rows}-${seed}${kind}-v${FORMAT_VERSION}.csv`);
  if (existsSync(path)) return path;
  const random = createSeededRandom(seed);
  const u = () => random.nextUniform();
  const centres = Array.from({ length: 400 }, () => [Math.asin(2 * u() - 1) * (180 / Math.PI), 360 * u() - 180]);
  const partial = `${path}.part`;
  const out = createWriteStream(partial);
  out.write(plates === undefined ? 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,collection,environment\n' : 'taxon,oldest_ma,youngest_ma,lat,lon,plate_id,collection,environment\n');
  let written = 0;
  let collection = 0;
  while (written < rows) {
    collection++;
    const [clat, clon] = centres[Math.floor(u() * centres.length)];
    const lat = Math.max(-90, Math.min(90, clat + (u() - 0.5) * 16));
    const lon = ((clon + (u() - 0.5) * 24 + 540) % 360) - 180;
    const oldestMa = OLDEST_MA * u();
    const youngestMa = Math.max(0, oldestMa - 12 * u());
    const size = 1 + Math.floor(u() * 12);
    const env = u() < 0.7 ? 'marine' : '"terrestrial, fluvial"';
    const place = `${lat.toFixed(4)},${lon.toFixed(4)}${plates === undefined ? '' : `,${plates[Math.floor(u() * plates.length)]}`}`;
    let chunk = '';
    for (let k = 0; k < size && written < rows; k++, written++) {
      const taxon = `Genus${Math.floor(u() * u() * 20000)}`;
      chunk += `${taxon},${oldestMa.toFixed(2)},${youngestMa.toFixed(2)},${place},C${collection},${env}\n`;
    }
    if (!out.write(chunk)) await new Promise<void>((resolve) => out.once('drain', () => resolve()));
  }
  await new Promise<void>((resolve, reject) => out.end((error?: Error | null) => (error ? reject(error) : resolve())));
  renameSync(partial, path);
  return path;
}
