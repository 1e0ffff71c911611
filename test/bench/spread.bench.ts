// The whole `coverage` command on a 1,000,000-row table whose places are spread out (spread-table.ts:
// nearly every row its own place, over the whole globe), 5-Myr bins on healpix:64, so that most
// rows occupy a slice-cell of their own and the cell exports are hundreds of megabytes. Beside it,
// alternately in the same run, the reference: papaparse parsing the same file into typed-array
// columns (numbers into Float64Arrays, text into dictionary codes), in a process of its own
// (parse-to-columns.mjs), measured the same way.
// Target (issue 9): the command ≤ 2× the reference, peak RSS ≤ 1 GB.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spreadTable } from './spread-table';

const ROWS = 1_000_000;
const RUNS = 5;

interface Figures { wallMs: number; cpuMs: number; peakRssMb: number }

function runMeasured(args: readonly string[]): Figures {
  const t0 = performance.now();
  const child = spawnSync(process.execPath, ['--import', './test/bench/report-peak-memory.mjs', ...args], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const wallMs = performance.now() - t0;
  if (child.status !== 0) throw new Error(`${args.join(' ')} failed:\n${child.stderr}`);
  const rss = /peak_rss_kb=(\d+)/.exec(child.stderr);
  const cpu = /cpu_us=(\d+)/.exec(child.stderr);
  return { wallMs, cpuMs: cpu ? Number(cpu[1]) / 1000 : NaN, peakRssMb: rss ? Number(rss[1]) / 1024 : NaN };
}

function summarise(label: string, runs: readonly Figures[]): Figures {
  const walls = runs.map((r) => r.wallMs);
  const mean = walls.reduce((a, b) => a + b, 0) / walls.length;
  const sd = Math.sqrt(walls.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, walls.length - 1));
  const min: Figures = { wallMs: Math.min(...walls), cpuMs: Math.min(...runs.map((r) => r.cpuMs)), peakRssMb: Math.max(...runs.map((r) => r.peakRssMb)) };
  console.log(`${label.padEnd(52)} wall min ${(min.wallMs / 1000).toFixed(2)} s, mean ${(mean / 1000).toFixed(2)} ± ${(sd / 1000).toFixed(2)} s (n=${runs.length}); ` +
    `CPU min ${(min.cpuMs / 1000).toFixed(2)} s; peak RSS ${min.peakRssMb.toFixed(0)} MB`);
  return min;
}

export async function run(): Promise<void> {
  const table = await spreadTable(ROWS);
  const out = mkdtempSync(join(tmpdir(), 'driftgrid-bench-spread-'));
  try {
    const cli = ['bin/driftgrid.js', 'coverage', table, '--bins', 'equal:5', '--grid', 'healpix:64', '--out', out, '--quiet'];
    const parse = ['test/bench/parse-to-columns.mjs', table, String(ROWS)];
    runMeasured(cli); // warm-up: file cache
    runMeasured(parse);
    const ours: Figures[] = [];
    const reference: Figures[] = [];
    for (let r = 0; r < RUNS; r++) {
      ours.push(runMeasured(cli));
      reference.push(runMeasured(parse));
    }
    const cells = readFileSync(join(out, 'cells.csv'), 'utf8').split('\n').length - 2;
    const sizes = readdirSync(out).map((name) => `${name} ${(statSync(join(out, name)).size / 1e6).toFixed(0)} MB`).join(', ');
    console.log(`spread-out table: ${ROWS} rows, ${(statSync(table).size / 1e6).toFixed(0)} MB; ${cells} occupied slice-cells; ${sizes}`);
    const a = summarise('driftgrid coverage, equal:5, healpix:64', ours);
    const b = summarise('reference: papaparse → typed columns (own process)', reference);
    console.log(`${''.padEnd(52)} ratio ours/reference: wall ${(a.wallMs / b.wallMs).toFixed(2)}x, CPU ${(a.cpuMs / b.cpuMs).toFixed(2)}x   target ≤ 2x, ≤ 1024 MB`);
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}
