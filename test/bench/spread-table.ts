// A seeded synthetic occurrence table whose places are spread out: nearly every row its own
// collection at its own place, uniform over the whole globe, ages uniform over the Phanerozoic.
// With 5-Myr bins and a fine grid nearly every row occupies a slice-cell of its own, so the cell
// exports are about as large as the table allows (the opposite of synthetic-table.ts's clusters).
import { createWriteStream, existsSync, renameSync } from 'node:fs';
import { once } from 'node:events';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createSeededRandom } from '../../src/time';

const FORMAT_VERSION = 1;
const OLDEST_MA = 538;
const TAXA = 50_000;
/** One collection in this many holds two rows at one place, the rest one row each. */
const PAIRED_EVERY = 20;

/** Path of the cached spread-out table with `rows` rows for `seed`, written on first use. */
export async function spreadTable(rows: number, seed = 11): Promise<string> {
  const path = join(tmpdir(), `driftgrid-bench-spread-${rows}-${seed}-v${FORMAT_VERSION}.csv`);
  if (existsSync(path)) return path;
  const random = createSeededRandom(seed);
  const u = () => random.nextUniform();
  const partial = `${path}.part`;
  const out = createWriteStream(partial);
  let block = 'taxon,max_ma,min_ma,palaeo_lat,palaeo_lon,collection,environment\n';
  let written = 0;
  for (let collection = 1; written < rows; collection++) {
    // Uniform on the sphere: latitude from the arcsine of a uniform sine.
    const lat = Math.asin(2 * u() - 1) * (180 / Math.PI);
    const lon = 360 * u() - 180;
    const maxMa = OLDEST_MA * u();
    const minMa = Math.max(0, maxMa - 4 * u());
    const env = u() < 0.7 ? 'marine' : '"terrestrial, fluvial"';
    const size = collection % PAIRED_EVERY === 0 ? 2 : 1;
    for (let k = 0; k < size && written < rows; k++, written++) {
      block += `Genus${Math.floor(u() * TAXA)},${maxMa.toFixed(2)},${minMa.toFixed(2)},${lat.toFixed(4)},${lon.toFixed(4)},C${collection},${env}\n`;
    }
    if (block.length > 1 << 16) {
      if (!out.write(block)) await once(out, 'drain');
      block = '';
    }
  }
  out.end(block);
  await once(out, 'finish');
  renameSync(partial, path);
  return path;
}
