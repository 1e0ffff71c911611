import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import geodesic from 'geographiclib-geodesic';
import { runCli } from './run-cli';

const R_M = 6371008.8;
/** geographiclib on a sphere of the IUGG mean radius (flattening 0): an outside reference. */
const sphere = new geodesic.Geodesic.Geodesic(R_M, 0);
const tempDir = (label: string) => mkdtempSync(join(tmpdir(), `driftgrid-${label}-`));
const readCsv = (path: string) => Papa.parse<Record<string, string>>(readFileSync(path, 'utf8'), { header: true, skipEmptyLines: true }).data;

describe('driftgrid coverage on a small hand-made table', () => {
  // With --bins equal:10 the bins reach back to the oldest age (18 Ma): 20–10 and 10–0 Ma.
  // Slice 20–10 Ma holds a triangle of sites (0°,0°), (0°,10°E), (10°N,0°); slice 10–0 Ma one
  // site twice.
  const table = [
    'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,collection',
    'Alpha,16,14,0,0,c1',
    'Beta,16,14,0,0,c1',
    'Alpha,18,12,0,10,c2',
    'Gamma,11,11,10,0,c3',
    'Delta,5,3,-20,40,c4',
    'Delta,9,1,-20,40,c4',
  ].join('\n');
  let out: string;
  let input: string;

  beforeAll(async () => {
    const dir = tempDir('small');
    input = join(dir, 'small.csv');
    writeFileSync(input, table);
    out = join(dir, 'results');
    const run = await runCli('coverage', input, '--bins', 'equal:10', '--grid', 'healpix:4', '--out', out, '--quiet');
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
  });

  it('writes slices.csv with the contract columns, oldest first, counts worked by hand', () => {
    const text = readFileSync(join(out, 'slices.csv'), 'utf8');
    expect(text.split('\n')[0]).toBe('slice,name,base_ma,top_ma,occurrences,collections,taxa,cells,hull_km2,mst_km,lat_min,lat_max,lat_span,centroid_lat,centroid_lon,hull_lever_lat,hull_lever_lon,hull_without_km2,span_without_deg');
    const rows = readCsv(join(out, 'slices.csv'));
    expect(rows.map((r) => Number(r.base_ma))).toEqual([20, 10]);
    const [older, younger] = rows;
    expect([older.occurrences, older.collections, older.taxa, older.lat_min, older.lat_max]).toEqual(['4', '3', '3', '0.000000', '10.000000']);
    expect([younger.occurrences, younger.collections, younger.taxa, younger.cells, younger.hull_km2, younger.mst_km]).toEqual(['2', '1', '1', '1', '', '0.000']);
  });

  it('measures the triangle hull area and the spanning tree as geographiclib does on the same sphere', () => {
    const older = readCsv(join(out, 'slices.csv'))[0];
    const polygon = sphere.Polygon(false);
    for (const [lat, lon] of [[0, 0], [0, 10], [10, 0]]) polygon.AddPoint(lat, lon);
    const area = Math.abs(polygon.Compute(false, true).area ?? NaN) / 1e6;
    expect(Number(older.hull_km2)).toBeCloseTo(area, 0);
    // Spanning tree of the triangle: the two 10° sides meeting at (0°, 0°).
    const side = (lat2: number, lon2: number) => (sphere.Inverse(0, 0, lat2, lon2).s12 ?? NaN) / 1000;
    expect(Number(older.mst_km)).toBeCloseTo(side(0, 10) + side(10, 0), 2);
  });

  it('names the hull lever of the triangle slice and leaves no hull without it; the single-site slice has none', () => {
    const [older, younger] = readCsv(join(out, 'slices.csv'));
    // Three places: removing any one leaves two, no hull, so every place ties and the first met
    // (0°, 0°, line 2) is the lever. The span without (10°N, 0°) is 0.
    expect([older.hull_lever_lat, older.hull_lever_lon, older.hull_without_km2, older.span_without_deg]).toEqual(['0.000000', '0.000000', '', '0.000000']);
    expect([younger.hull_lever_lat, younger.hull_lever_lon, younger.hull_without_km2, younger.span_without_deg]).toEqual(['', '', '', '']);
  });

  it('writes one cells.csv row per occupied (slice, cell) whose counts add up to the slice', () => {
    const cells = readCsv(join(out, 'cells.csv'));
    expect(cells.every((c) => c.grid === 'healpix:4')).toBe(true);
    const slices = readCsv(join(out, 'slices.csv'));
    slices.forEach((s, i) => {
      const mine = cells.filter((c) => Number(c.slice) === i + 1);
      expect(mine.length).toBe(Number(s.cells));
      expect(mine.reduce((sum, c) => sum + Number(c.occurrences), 0)).toBe(Number(s.occurrences));
    });
  });

  it('writes cells.geojson as an RFC 7946 FeatureCollection matching cells.csv', () => {
    const geojson = JSON.parse(readFileSync(join(out, 'cells.geojson'), 'utf8')) as GeoJSON.FeatureCollection;
    const cells = readCsv(join(out, 'cells.csv'));
    expect(geojson.type).toBe('FeatureCollection');
    expect(geojson.features.map((f) => String(f.properties?.cell))).toEqual(cells.map((c) => c.cell));
  });

  it('records every setting and the SHA-256 of the input in session.json, and a rerun reproduces the CSVs byte for byte', async () => {
    const session = JSON.parse(readFileSync(join(out, 'session.json'), 'utf8'));
    expect(session.settings).toEqual({
      bins: 'equal:10', assign: 'mid-age', seed: 1, grid: 'healpix:4', map: {}, rotateAt: 'slice', preferModel: false, beyondModel: 'reject',
    });
    const sha = execFileSync('sha256sum', [input], { encoding: 'utf8' }).split(' ')[0];
    expect(session.inputs.occurrences.sha256).toBe(sha);
    const again = join(out, '..', 'again');
    expect((await runCli('coverage', '--session', join(out, 'session.json'), '--out', again, '--quiet')).status).toBe(0);
    for (const name of ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv']) {
      expect(readFileSync(join(again, name), 'utf8')).toBe(readFileSync(join(out, name), 'utf8'));
    }
  });

  it('reruns a session file written before format 3, reading its former names, and records the present ones', async () => {
    // The table's own column names would not be found by synonym, so the recorded map must be read.
    const dir = tempDir('former');
    const renamed = join(dir, 'renamed.csv');
    writeFileSync(renamed, table.replace('taxon,oldest_ma,youngest_ma,', 'taxon,from,to,'));
    const sha256 = execFileSync('sha256sum', [renamed], { encoding: 'utf8' }).split(' ')[0];
    const former = {
      format: 'driftgrid-session', formatVersion: 2, tool: { name: 'driftgrid', version: '0.1.0' },
      inputs: { occurrences: { path: 'renamed.csv', sha256, bytes: readFileSync(renamed).length } },
      settings: { bins: 'equal:10', assign: 'midpoint', seed: 1, grid: 'healpix:4', map: { max_ma: 'from', min_ma: 'to' }, rotateAt: 'slice', preferModel: false, beyondModel: 'reject' },
      summary: {},
    };
    writeFileSync(join(dir, 'session.json'), JSON.stringify(former));
    const run = await runCli('coverage', '--session', join(dir, 'session.json'), '--out', join(dir, 'again'), '--quiet');
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    for (const name of ['slices.csv', 'cells.csv']) expect(readFileSync(join(dir, 'again', name), 'utf8')).toBe(readFileSync(join(out, name), 'utf8'));
    const written = JSON.parse(readFileSync(join(dir, 'again', 'session.json'), 'utf8'));
    expect(written.formatVersion).toBe(3);
    expect(written.settings).toMatchObject({ assign: 'mid-age', map: { oldest_ma: 'from', youngest_ma: 'to' } });
  });

  it('refuses to rerun a session whose input has changed since', async () => {
    const dir = tempDir('changed');
    const copy = join(dir, 'table.csv');
    copyFileSync(input, copy);
    await runCli('coverage', copy, '--bins', 'equal:10', '--out', join(dir, 'r'), '--quiet');
    writeFileSync(copy, table + '\nEpsilon,5,3,1,1,c9');
    const run = await runCli('coverage', '--session', join(dir, 'r', 'session.json'), '--out', join(dir, 'again'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/has changed since the session was recorded/);
  });
});

describe('driftgrid coverage safeguards', () => {
  it('never writes over an input file, even when --out is its folder', async () => {
    const dir = tempDir('overwrite');
    const input = join(dir, 'slices.csv');
    const text = 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon\nAlpha,10,5,1,1\n';
    writeFileSync(input, text);
    const run = await runCli('coverage', input, '--out', dir);
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/Refusing to write .*slices\.csv: it is one of the input files/);
    expect(readFileSync(input, 'utf8')).toBe(text);
  });

  it('counts distinct positions as collections when the table names none, and says so', async () => {
    const dir = tempDir('nocollections');
    const input = join(dir, 't.csv');
    writeFileSync(input, 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon\nA,10,5,1,1\nB,10,5,1,1\nC,10,5,2,2\n');
    const run = await runCli('coverage', input, '--bins', 'equal:10', '--out', join(dir, 'r'));
    expect(run.stdout).toMatch(/names no collections: "collections" counts distinct positions/);
    expect(readCsv(join(dir, 'r', 'slices.csv'))[0].collections).toBe('2');
  });

  it('names the one row that alone stretches equal bins far back, and stays quiet under chart bins', async () => {
    const dir = tempDir('stretch');
    const input = join(dir, 't.csv');
    // 5000 typed for 500 on line 3 would be refused (older than the Earth); 4000 is a possible slip.
    writeFileSync(input, 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon\nA,500,490,1,1\nB,4000,3990,1,1\nC,480,470,2,2\n');
    const run = await runCli('coverage', input, '--bins', 'equal:10', '--out', join(dir, 'r'));
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/note: line 3 alone stretches the equal bins back to 4000 Ma: its oldest_ma is 4000 Ma, every other row's is 500 Ma or younger/);
    const stages = await runCli('coverage', input, '--bins', 'stages', '--out', join(dir, 's'));
    expect(stages.stdout).not.toMatch(/stretches/);
  });

  it('gives the same results for --assign draw with the same seed, and different ones with another', async () => {
    const dir = tempDir('draw');
    const input = join(dir, 't.csv');
    const rows = Array.from({ length: 200 }, (_, i) => `T${i % 17},${40 + (i % 7)},${(i * 7) % 30},${(i % 50) - 25},${(i * 13) % 300 - 150}`);
    writeFileSync(input, ['taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon', ...rows].join('\n'));
    const runWith = async (seed: string, name: string) => {
      await runCli('coverage', input, '--bins', 'equal:5', '--assign', 'draw', '--seed', seed, '--out', join(dir, name), '--quiet');
      return readFileSync(join(dir, name, 'slices.csv'), 'utf8');
    };
    const first = await runWith('42', 'a');
    expect(await runWith('42', 'b')).toBe(first);
    expect(await runWith('43', 'c')).not.toBe(first);
  });
});

describe('the built command', () => {
  beforeAll(() => {
    execFileSync(process.execPath, ['scripts/build-cli.mjs']);
  });

  it('exits with status 1 and a one-line message, no stack trace, on a file it cannot read', () => {
    const child = spawnSync(process.execPath, ['bin/driftgrid.js', 'coverage', 'test/fixtures/bad/binary-garbage.bin', '--out', tempDir('spawn')], { encoding: 'utf8' });
    expect(child.status).toBe(1);
    expect(child.stderr).toMatch(/^driftgrid: test\/fixtures\/bad\/binary-garbage\.bin: file "binary data \(a NUL byte at offset \d+\)": expected a CSV or TSV text file\n$/);
    expect(child.stderr).not.toMatch(/\n\s+at /);
  });

  it('runs the demo scenario and prints a summary', () => {
    const child = spawnSync(process.execPath, ['bin/driftgrid.js', 'coverage', 'assets/demo/occurrences.csv', '--out', tempDir('demo')], { encoding: 'utf8' });
    expect(child.status).toBe(0);
    expect(child.stdout).toMatch(/rows read: 49,906; accepted: 49,906; rejected: 0/);
    expect(child.stdout).toMatch(/elapsed: \d+\.\d\d s/);
    // The demo's two widest slices span more than a hemisphere: named, grouped by reason.
    expect(child.stdout).toMatch(/\n {2}2 slice\(s\) with no convex hull, positions do not fit in an open hemisphere \(hull_km2 left empty\): Campanian, Maastrichtian\n/);
  });
});
