// The worker runs the same core as the command line: its exports must be the command line's
// files byte for byte, and its view must agree with its own slices (the CLI is the reference
// here; the core's numbers are checked against outside references in test/sphere, test/grid…).
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFAULT_RUN_SETTINGS, type RunSettings } from '../../src/run';
import type { AnalysisView } from '../../web/protocol';
import { readExtra, readOccurrenceTable } from '../../web/worker/read-inputs';
import { Workbench } from '../../web/worker/workbench';
import { runCli } from '../cli/run-cli';

const DEMO = 'assets/demo';
const fileOf = (path: string): File => new File([readFileSync(path)], path.split('/').pop() ?? path);
const source = (path: string) => ({ kind: 'file' as const, file: fileOf(path) });
const progress = { onBytes: () => undefined, signal: new AbortController().signal };
const text = (bytes: Uint8Array) => new TextDecoder().decode(bytes);

async function demoWorkbench(table: string): Promise<Workbench> {
  const bench = new Workbench();
  bench.setTable(await readOccurrenceTable(source(table), {}, progress));
  bench.setExtra(await readExtra('rotation', source(`${DEMO}/poles.csv`)));
  return bench;
}

describe('the analysis worker', () => {
  it('writes slices.csv, cells.csv and rejects.csv exactly as the command line does for the same settings', async () => {
    const table = `${DEMO}/occurrences-with-problems.csv`;
    const bench = await demoWorkbench(table);
    bench.analyse({ ...DEFAULT_RUN_SETTINGS, grid: { kind: 'healpix', nside: 16 }, bins: { kind: 'chart', rank: 'epochs' } });
    const out = mkdtempSync(join(tmpdir(), 'dg-worker-'));
    const run = await runCli('coverage', table, '--bins', 'epochs', '--grid', 'healpix:16', '--rotation', `${DEMO}/poles.csv`, '--out', out, '--quiet');
    expect(run.status).toBe(0);
    for (const file of ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv'] as const) {
      const { bytes } = await bench.exportFile(file);
      expect(text(bytes), file).toBe(readFileSync(join(out, file), 'utf8'));
    }
    const session = JSON.parse(text((await bench.exportFile('session.json')).bytes));
    const cliSession = JSON.parse(readFileSync(join(out, 'session.json'), 'utf8'));
    expect(session.settings).toEqual(cliSession.settings);
    expect(session.inputs.occurrences.sha256).toBe(cliSession.inputs.occurrences.sha256);
    expect(session.summary).toEqual(cliSession.summary);
    expect(session.tool).toEqual(cliSession.tool);
  });

  it('writes curves.csv and regions.geojson exactly as the command line does for the same settings', async () => {
    const table = `${DEMO}/occurrences.csv`;
    const bench = await demoWorkbench(table);
    const curves = { quorum: 0.5, trials: 50, rarefy: 20, regionKm: 1500 };
    bench.analyse({ ...DEFAULT_RUN_SETTINGS, seed: 7, grid: { kind: 'healpix', nside: 16 }, curves });
    const out = mkdtempSync(join(tmpdir(), 'dg-worker-curves-'));
    const run = await runCli('curves', table, '--grid', 'healpix:16', '--seed', '7', '--quorum', '0.5', '--trials', '50', '--rarefy', '20',
      '--rotation', `${DEMO}/poles.csv`, '--out', out, '--quiet');
    expect(run.status).toBe(0);
    for (const file of ['curves.csv', 'regions.geojson'] as const) {
      const { bytes } = await bench.exportFile(file);
      expect(text(bytes), file).toBe(readFileSync(join(out, file), 'utf8'));
    }
    const session = JSON.parse(text((await bench.exportFile('session.json')).bytes));
    expect(session.settings).toEqual(JSON.parse(readFileSync(join(out, 'session.json'), 'utf8')).settings);
  });

  it('writes gaps.csv, gaps.geojson and belts.csv exactly as driftgrid gaps does, indicators placed by the same path', async () => {
    const table = `${DEMO}/occurrences.csv`;
    const bench = await demoWorkbench(table);
    bench.setExtra(await readExtra('indicators', source(`${DEMO}/indicators.csv`)));
    bench.analyse({ ...DEFAULT_RUN_SETTINGS, grid: { kind: 'healpix', nside: 8 }, bins: { kind: 'chart', rank: 'epochs' } });
    const out = mkdtempSync(join(tmpdir(), 'dg-worker-gaps-'));
    const run = await runCli(
      'gaps', table, '--area', 'occupied', '--bins', 'epochs', '--grid', 'healpix:8', '--rotation', `${DEMO}/poles.csv`,
      '--indicators', `${DEMO}/indicators.csv`, '--out', out, '--quiet',
    );
    expect(run.stderr).toBe('');
    for (const file of ['gaps.csv', 'gaps.geojson', 'belts.csv'] as const) {
      const { bytes } = await bench.exportFile(file);
      expect(text(bytes), file).toBe(readFileSync(join(out, file), 'utf8'));
    }
  });

  it('refuses settings in a message as a session file refuses them, naming the request', async () => {
    const bench = await demoWorkbench(`${DEMO}/occurrences.csv`);
    const bad = { ...DEFAULT_RUN_SETTINGS, rotateAt: 'sideways', grid: { kind: 'healpix', nside: 33 } } as unknown as RunSettings;
    expect(() => bench.analyse(bad)).toThrow([
      'the analysis request, settings.grid "healpix:33": expected healpix:NSIDE (NSIDE a power of two, 1–8192) or bands:DEG (0 < DEG <= 90)',
      'the analysis request, settings.rotateAt "sideways": expected slice or occurrence',
    ].join('\n'));
  });

  it('hands the views per-slice data that agrees with the slice numbers', async () => {
    const bench = await demoWorkbench(`${DEMO}/occurrences.csv`);
    bench.setExtra(await readExtra('polygons', source(`${DEMO}/land.geojson`)));
    bench.setExtra(await readExtra('indicators', source(`${DEMO}/indicators.csv`)));
    const { view, transfer } = bench.analyse(DEFAULT_RUN_SETTINGS);
    const n = view.slices.length;
    expect(new Set(transfer).size).toBe(transfer.length);
    expect(view.periods[view.slices.findIndex((s) => s.name === 'Campanian')]).toBe('Cretaceous');
    let occupiedSlices = 0;
    for (let s = 0; s < n; s++) {
      const slice = view.slices[s];
      expect(view.positions.sliceStart[s + 1] - view.positions.sliceStart[s]).toBe(slice.positions);
      expect(view.cells.sliceStart[s + 1] - view.cells.sliceStart[s]).toBe(slice.cells);
      let occurrences = 0;
      for (let k = view.cells.sliceStart[s]; k < view.cells.sliceStart[s + 1]; k++) occurrences += view.cells.occurrences[k];
      expect(occurrences).toBe(slice.occurrences);
      let inBands = 0;
      for (let b = 0; b < view.latitude.bands; b++) inBands += view.latitude.perSlice[s * view.latitude.bands + b];
      expect(inBands).toBe(slice.occurrences);
      expect(view.hulls.sliceStart[s + 1] - view.hulls.sliceStart[s]).toBe(Number.isFinite(slice.hullKm2) ? 1 : 0);
      expect(view.spanningTrees.sliceStart[s + 1] - view.spanningTrees.sliceStart[s]).toBe(Math.max(0, slice.positions - 1));
      if (slice.occurrences > 0) occupiedSlices++;
    }
    expect(occupiedSlices).toBeGreaterThan(20);
    expect(view.basePolygons).toHaveLength(n);
    expect(view.indicators?.kinds.length).toBeGreaterThan(1);
    checkCellShapes(view);
  });

  it('names the lines of the rows at each slice’s hull lever', async () => {
    // A 10° square of places, one inside, and a far place (30°N, 5°E) on lines 5 and 8: it about
    // doubles the hull (test/sphere/hull-lever.test.ts works this slice against geographiclib).
    const rows = ['0,0', '0,10', '10,10', '30,5', '10,0', '5,5', '30,5'].map((place, k) => `T${k},8,6,${place}`);
    const csv = ['taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon', ...rows].join('\n');
    const bench = new Workbench();
    bench.setTable(await readOccurrenceTable({ kind: 'file', file: new File([csv], 'lever.csv') }, {}, progress));
    const { view } = bench.analyse({ ...DEFAULT_RUN_SETTINGS, bins: { kind: 'equal', widthMyr: 10 } });
    expect(view.slices).toHaveLength(1);
    expect([view.slices[0].hullLeverLat, view.slices[0].hullLeverLon]).toEqual([30, 5]);
    expect(Array.from(view.leverRows.line)).toEqual([5, 8]);
    expect(Array.from(view.leverRows.sliceStart)).toEqual([0, 2]);
  });

  it('lists the taxa of one cell from the rows in it', async () => {
    const bench = await demoWorkbench(`${DEMO}/occurrences.csv`);
    const { view } = bench.analyse(DEFAULT_RUN_SETTINGS);
    const s = view.slices.findIndex((x) => x.occurrences > 0);
    const entry = view.cells.sliceStart[s];
    const taxa = bench.cellTaxa(s, view.cells.cell[entry]);
    expect(taxa).toHaveLength(view.cells.taxa[entry]);
    expect([...taxa].sort((a, b) => a.localeCompare(b))).toEqual(taxa);
  });
});

/** Every cell's outline is closed and its centre lies within the outline's latitude range. */
function checkCellShapes(view: AnalysisView): void {
  const { ringStart, coords, centre } = view.shapes;
  for (let r = 0; r + 1 < ringStart.length; r++) {
    const a = ringStart[r], b = ringStart[r + 1] - 1;
    expect(coords[2 * a]).toBeCloseTo(coords[2 * b], 4);
    expect(coords[2 * a + 1]).toBeCloseTo(coords[2 * b + 1], 4);
    let minLat = 90, maxLat = -90;
    for (let v = a; v <= b; v++) {
      minLat = Math.min(minLat, coords[2 * v + 1]);
      maxLat = Math.max(maxLat, coords[2 * v + 1]);
    }
    expect(centre[2 * r + 1]).toBeGreaterThanOrEqual(minLat - 1e-4);
    expect(centre[2 * r + 1]).toBeLessThanOrEqual(maxLat + 1e-4);
  }
}
