// The whole command-line path on a 1,000,000-row table with about 100 slices (the chart's stages),
// against the straightforward reference in reference-pipeline.ts. Targets (issue: core pipeline):
// end to end ≤ 3 s wall and peak RSS ≤ 1 GB on a 2-core machine. Then the same command on the
// same places given as present-day positions on the demo's plates, placed by its rotation model
// (every row clamped into the model's reach), at each slice's mid-age and at each row's own age:
// what the rotation costs end to end.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { syntheticTable } from './synthetic-table';
import { demoModel } from './rotation-fixtures';

const ROWS = 1_000_000;
const RUNS = 3;

interface ProcessFigures { wallMs: number; peakRssMb: number; stdout: string }

function runProcess(args: string[]): ProcessFigures {
  const t0 = performance.now();
  const child = spawnSync(process.execPath, ['--import', './test/bench/report-peak-memory.mjs', ...args], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const wallMs = performance.now() - t0;
  if (child.status !== 0) throw new Error(`${args.join(' ')} failed:\n${child.stderr}`);
  const rss = /peak_rss_kb=(\d+)/.exec(child.stderr);
  return { wallMs, peakRssMb: rss ? Number(rss[1]) / 1024 : NaN, stdout: child.stdout };
}

function summarise(label: string, runs: ProcessFigures[], target: string): number {
  const walls = runs.map((r) => r.wallMs);
  const mean = walls.reduce((a, b) => a + b, 0) / walls.length;
  const sd = Math.sqrt(walls.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, walls.length - 1));
  const min = Math.min(...walls);
  const rss = Math.max(...runs.map((r) => r.peakRssMb));
  console.log(`${label.padEnd(44)} wall min ${(min / 1000).toFixed(2)} s, mean ${(mean / 1000).toFixed(2)} ± ${(sd / 1000).toFixed(2)} s (n=${runs.length}); peak RSS ${rss.toFixed(0)} MB   ${target}`);
  return min;
}

export async function run(): Promise<void> {
  const table = await syntheticTable(ROWS);
  const out = mkdtempSync(join(tmpdir(), 'driftgrid-bench-out-'));
  try {
    const cli = ['bin/driftgrid.js', 'coverage', table, '--bins', 'stages', '--grid', 'healpix:32', '--out', out, '--quiet'];
    runProcess(cli); // warm-up: file cache
    const ours = Array.from({ length: RUNS }, () => runProcess(cli));
    const reference = Array.from({ length: RUNS }, () => runProcess(['--import', 'tsx', 'test/bench/reference-pipeline.ts', table]));
    const oursMin = summarise('driftgrid coverage, 1M rows, stages, healpix:32', ours, 'target ≤ 3 s, ≤ 1024 MB');
    const refMin = summarise('reference (row objects, string Sets, no spanning tree but one)', reference, '');
    console.log(`${''.padEnd(44)} ratio reference/ours (wall): ${(refMin / oursMin).toFixed(1)}x`);
    const figures = JSON.parse(reference[0].stdout) as { mstMs: number; mstPositions: number; slices: number[][] };
    console.log(`${''.padEnd(44)} reference brute-force spanning tree on ${figures.mstPositions} positions alone: ${(figures.mstMs / 1000).toFixed(2)} s`);
    const slices = readFileSync(join(out, 'slices.csv'), 'utf8').trim().split('\n').slice(1).map((line) => line.split(','));
    const agree = slices.every((f, s) => [f[4], f[5], f[6], f[7]].map(Number).join() === figures.slices[s].join());
    console.log(`${''.padEnd(44)} per-slice occurrences, collections, taxa, cells agree with the reference: ${agree ? 'yes' : 'NO'}`);
    const modelTable = await syntheticTable(ROWS, 7, demoModel().plateIds());
    const rotated = [...cli.slice(0, 2), modelTable, ...cli.slice(3), '--rotation', 'assets/demo/poles.csv', '--beyond-model', 'clamp'];
    for (const [label, args] of [['… placed by the model at slice mid-ages', rotated], ['… placed by the model at each row\'s own age', [...rotated, '--rotate-at', 'occurrence']]] as const) {
      runProcess([...args]); // warm-up: file cache
      const min = summarise(label, Array.from({ length: RUNS }, () => runProcess([...args])), '');
      console.log(`${''.padEnd(44)} more than from the table's palaeocoordinates: ${((min - oursMin) / 1000).toFixed(2)} s`);
    }
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}
