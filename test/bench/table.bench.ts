// Reading a 1,000,000-row occurrence table: our streaming scanner into typed-array columns, against
// papaparse (header: true, dynamicTyping) building one object per row, in the same process.
// Run: npx tsx test/bench/table.bench.ts (or through `npm run bench`).
import { createWriteStream } from 'node:fs';
import { readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import Papa from 'papaparse';
import { readTableFile } from '../../src/cli/read-table-file';

const ROWS = 1_000_000;
const SEED = 20240611;
const WARM_UP = 1;
const REPETITIONS = 3;

/** mulberry32, a small seeded generator (common practice for reproducible test data). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const TAXA = 40_000;
const MAX_PER_COLLECTION = 16;

/**
 * Writes a made-up table of ROWS rows (about 57 MB) shaped like a compilation: rows come in
 * collections of 1-16 occurrences sharing age range, position and plate; taxa are drawn from a
 * skewed pool of 40,000 names; one row in 50 has a quoted taxon (with a comma and "" inside).
 */
async function writeTable(path: string): Promise<number> {
  const random = mulberry32(SEED);
  const out = createWriteStream(path);
  let bytes = 0;
  let block = 'taxon,collection,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,plate_id\n';
  let left = 0;
  let shared = '';
  for (let i = 0; i < ROWS; i++) {
    if (left === 0) {
      left = 1 + Math.floor(random() * MAX_PER_COLLECTION);
      const top = random() * 300;
      const base = top + random() * 12;
      const lat = (random() * 180 - 90).toFixed(3);
      const lon = (random() * 360 - 180).toFixed(3);
      shared = `c${100000 + i},${base.toFixed(1)},${top.toFixed(1)},${lat},${lon},${Math.floor(random() * 900) + 100}`;
    }
    left--;
    const t = Math.floor(TAXA * random() ** 3);
    const genus = `Genus${1000 + (t >> 4)}`;
    const species = `species${10 + (t & 15)}`;
    const taxon = i % 50 === 0 ? `"${genus}, cf. ""${species}"""` : `${genus} ${species}`;
    block += `${taxon},${shared}\n`;
    if (block.length > 1 << 16 || i === ROWS - 1) {
      bytes += Buffer.byteLength(block);
      if (!out.write(block)) await once(out, 'drain');
      block = '';
    }
  }
  out.end();
  await once(out, 'finish');
  return bytes;
}

interface Figures { times: number[]; cpu: number[]; peakRssMb: number; rows: number }

/** Runs `task` WARM_UP + REPETITIONS times, sampling resident memory every 10 ms. */
async function measure(task: () => Promise<number>): Promise<Figures> {
  const times: number[] = [];
  const cpu: number[] = [];
  let peak = 0;
  let rows = 0;
  const sampler = setInterval(() => { peak = Math.max(peak, process.memoryUsage.rss()); }, 10);
  for (let r = 0; r < WARM_UP + REPETITIONS; r++) {
    const t0 = performance.now();
    const c0 = process.cpuUsage();
    rows = await task();
    const c1 = process.cpuUsage(c0);
    const t1 = performance.now();
    peak = Math.max(peak, process.memoryUsage.rss());
    if (r >= WARM_UP) {
      times.push((t1 - t0) / 1000);
      cpu.push((c1.user + c1.system) / 1e6);
    }
  }
  clearInterval(sampler);
  return { times, cpu, peakRssMb: peak / 2 ** 20, rows };
}

function summary(name: string, f: Figures): string {
  const mean = f.times.reduce((s, t) => s + t, 0) / f.times.length;
  const sd = Math.sqrt(f.times.reduce((s, t) => s + (t - mean) ** 2, 0) / Math.max(1, f.times.length - 1));
  return `${name.padEnd(44)} wall min ${Math.min(...f.times).toFixed(2)} s, mean ${mean.toFixed(2)} ± ${sd.toFixed(2)} s; ` +
    `CPU min ${Math.min(...f.cpu).toFixed(2)} s; peak RSS ${f.peakRssMb.toFixed(0)} MB (${f.rows} rows)`;
}

export async function run(): Promise<void> {
  const path = join(tmpdir(), `driftgrid-table-bench-${process.pid}.csv`);
  try {
    const bytes = await writeTable(path);
    console.log(`table bench: ${ROWS} rows, ${(bytes / 1e6).toFixed(1)} MB, seed ${SEED}, ${WARM_UP} warm-up + ${REPETITIONS} runs each`);
    // Ours first: the process-wide peak RSS of a later run includes heap kept from earlier ones.
    const ours = await measure(async () => {
      const result = await readTableFile(path, { resolveInterval: () => undefined });
      if (result.rejects.length > 0) throw new Error(`unexpected reject: ${result.rejects[0].reason}`);
      return result.table.count;
    });
    console.log(summary('streaming scanner -> typed-array columns', ours));
    const reference = await measure(async () => {
      const text = await readFile(path, 'utf8');
      const parsed = Papa.parse<Record<string, unknown>>(text, { header: true, dynamicTyping: true, skipEmptyLines: true });
      if (parsed.errors.length > 0) throw new Error(`papaparse: ${parsed.errors[0].message}`);
      return parsed.data.length;
    });
    console.log(summary('papaparse header:true, dynamicTyping (rows)', reference));
    const ratio = Math.min(...reference.times) / Math.min(...ours.times);
    const cpuRatio = Math.min(...reference.cpu) / Math.min(...ours.cpu);
    console.log(`ratio papaparse / ours: wall ${ratio.toFixed(2)}x, CPU ${cpuRatio.toFixed(2)}x`);
  } finally {
    await rm(path, { force: true });
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
