import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { geoContains } from 'd3-geo';
import type { Feature, FeatureCollection, MultiPolygon, Polygon } from 'geojson';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { d3Area, geometryProblems } from '../export/polygon-checks';
import { runCli } from './run-cli';

const tempDir = (label: string) => mkdtempSync(join(tmpdir(), `driftgrid-${label}-`));
const readCsv = (path: string) => Papa.parse<Record<string, string>>(readFileSync(path, 'utf8'), { header: true, skipEmptyLines: true }).data;

const CURVES_HEADER = 'slice,name,base_ma,top_ma,taxa,range_through,n_FL,n_bL,n_Ft,n_bt,three_timers,part_timers,completeness_3t,'
  + 'goods_u,goods_u_refs,chao1,chao1_sd,rarefied,sqs_mean,sqs_lo,sqs_hi,sqs_draws,shared_cells,taxa_shared_prev,taxa_shared,'
  + 'regions,regional_mean,regional_sd,age_median,age_lo,age_hi,shift';

describe('driftgrid curves on a small hand-counted table', () => {
  // --bins equal:10 reaches back to the oldest age (36 Ma): slices 40–30, 30–20, 20–10 (empty), 10–0.
  // Sites: p1 (0°, 0°), p2 (0°, 10°E), p3 (10°N, 0°), p4 (20°S, 40°E), each its own healpix:32 cell.
  const table = [
    'taxon,max_ma,min_ma,palaeo_lat,palaeo_lon,collection',
    'A,36,34,0,0,c1', 'B,36,34,0,0,c1', 'A,36,34,0,10,c2', 'C,36,34,0,10,c2',
    'A,26,24,0,0,c3', 'D,26,24,0,0,c3', 'B,26,24,10,0,c4',
    'A,6,4,-20,40,c5', 'E,6,4,0,0,c6',
  ].join('\n');
  let dir: string;
  let input: string;
  const curvesArgs = ['--bins', 'equal:10', '--grid', 'healpix:32', '--quorum', '0.5', '--trials', '50', '--seed', '7', '--rarefy', '2', '--age-trials', '20'];

  beforeAll(async () => {
    dir = tempDir('curves');
    input = join(dir, 'small.csv');
    writeFileSync(input, table);
    const run = await runCli('curves', input, ...curvesArgs, '--out', join(dir, 'a'));
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
  });

  it('writes the contract columns, one row per slice, oldest first, keyed as slices.csv', () => {
    const text = readFileSync(join(dir, 'a', 'curves.csv'), 'utf8');
    expect(text.split('\n')[0]).toBe(CURVES_HEADER);
    expect(readCsv(join(dir, 'a', 'curves.csv')).map((r) => [r.slice, r.base_ma, r.top_ma])).toEqual([
      ['1', '40', '30'], ['2', '30', '20'], ['3', '20', '10'], ['4', '10', '0'],
    ]);
  });

  it('counts taxa, range-through and Foote\'s classes as worked by hand', () => {
    // Observed ranges: A slices 1–4, B 1–2, C 1, D 2, E 4 (Foote 2000: FL confined; bL crosses the
    // base only; Ft the top only; bt both).
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    const pick = (r: Record<string, string>) => [r.taxa, r.range_through, r.n_FL, r.n_bL, r.n_Ft, r.n_bt];
    expect(rows.map(pick)).toEqual([
      ['3', '3', '1', '0', '2', '0'],
      ['3', '3', '1', '1', '0', '1'],
      ['0', '1', '0', '0', '0', '1'],
      ['2', '2', '1', '1', '0', '0'],
    ]);
  });

  it('three-timers (Alroy 2008): only slices with a neighbour either side; 0/0 is empty, 0/1 is 0', () => {
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    expect(rows.map((r) => [r.three_timers, r.part_timers, r.completeness_3t])).toEqual([
      ['', '', ''], ['0', '0', ''], ['0', '1', '0.000000'], ['', '', ''],
    ]);
  });

  it('Good\'s u, Chao1 and Hurlbert rarefaction by their published formulas; empty where there is no sample', () => {
    // Good 1953: u = 1 − f1/N. Slice 1: N 4, A twice, B and C once: 1 − 2/4. Slices 2 and 4: all singletons.
    // Chao1 bias-corrected with k = (N − 1)/N (Chao 1987; EstimateS guide), worked by hand:
    //   slice 1: S 3, f1 2, f2 1, k 3/4: 3 + 0.375 = 3.375; var 0.375 + 0.6328125 + 0.03515625 → sd 1.021
    //   slice 2: S 3, f1 3, f2 0, k 2/3: 3 + 2 = 5; var 2 + 8.3333 → sd 3.215
    //   slice 4: S 2, f1 2, f2 0, k 1/2: 2 + 0.5; var 0.5 + 1.125 → sd 1.275
    // Hurlbert 1971, E[S_2] = Σ 1 − C(N − Ni, 2)/C(N, 2): slice 1: 5/6 + 1/2 + 1/2 = 1.833; slice 2: 3 · 2/3.
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    expect(rows.map((r) => [r.goods_u, r.goods_u_refs, r.chao1, r.chao1_sd, r.rarefied])).toEqual([
      ['0.500000', '', '3.375', '1.021', '1.833'],
      ['0.000000', '', '5.000', '3.215', '2.000'],
      ['', '', '', '', ''],
      ['0.000000', '', '2.500', '1.275', '2.000'],
    ]);
  });

  it('SQS: a quorum equal to the coverage needs every collection; below the quorum is empty, never 0', () => {
    // Slice 1: u = 0.5 and quorum 0.5, so drawing stops only when the frequencies sum to 1: both
    // collections, all 3 taxa, every trial. Slices 2 and 4 have u = 0 < 0.5; slice 3 is empty.
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    expect(rows.map((r) => [r.sqs_mean, r.sqs_lo, r.sqs_hi, r.sqs_draws])).toEqual([
      ['3.000', '3.000', '3.000', '2.000'], ['', '', '', ''], ['', '', '', ''], ['', '', '', ''],
    ]);
  });

  it('shared cells and the taxa in them, counted by hand; regions below the minimum are 0 with no mean', () => {
    // Slice 2 shares p1 with slice 1: slice 1 has A, B there; slice 2 has A, D. Slice 3 has no cells.
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    expect(rows.map((r) => [r.shared_cells, r.taxa_shared_prev, r.taxa_shared])).toEqual([
      ['', '', ''], ['1', '2', '2'], ['0', '0', '0'], ['0', '0', '0'],
    ]);
    expect(rows.map((r) => [r.regions, r.regional_mean, r.regional_sd])).toEqual([['0', '', ''], ['0', '', ''], ['0', '', ''], ['0', '', '']]);
  });

  it('age draws stay within each row\'s slice here, so every draw gives the raw count', () => {
    const rows = readCsv(join(dir, 'a', 'curves.csv'));
    expect(rows.map((r) => [r.age_median, r.age_lo, r.age_hi])).toEqual([
      ['3.000', '3.000', '3.000'], ['3.000', '3.000', '3.000'], ['0.000', '0.000', '0.000'], ['2.000', '2.000', '2.000'],
    ]);
    expect(rows.map((r) => r.shift)).toEqual(['', '', '', '']);
  });

  it('leaves the optional series empty when not asked for', async () => {
    const out = join(dir, 'plain');
    expect((await runCli('curves', input, '--bins', 'equal:10', '--out', out, '--quiet')).status).toBe(0);
    const rows = readCsv(join(out, 'curves.csv'));
    expect(rows.map((r) => [r.rarefied, r.age_median, r.age_lo, r.age_hi]).flat().every((v) => v === '')).toBe(true);
    const session = JSON.parse(readFileSync(join(out, 'session.json'), 'utf8'));
    expect(session.settings).toMatchObject({ quorum: 0.5, trials: 200, regionKm: 1500 });
    expect(session.settings.rarefy).toBeUndefined();
  });

  it('the same seed writes the same bytes; the session reruns to the same curves.csv', async () => {
    expect((await runCli('curves', input, ...curvesArgs, '--out', join(dir, 'b'), '--quiet')).status).toBe(0);
    const first = readFileSync(join(dir, 'a', 'curves.csv'));
    expect(readFileSync(join(dir, 'b', 'curves.csv')).equals(first)).toBe(true);
    const session = JSON.parse(readFileSync(join(dir, 'a', 'session.json'), 'utf8'));
    expect(session.settings).toMatchObject({ seed: 7, quorum: 0.5, trials: 50, rarefy: 2, ageTrials: 20, regionKm: 1500 });
    const rerun = await runCli('curves', '--session', join(dir, 'a', 'session.json'), '--out', join(dir, 'c'), '--quiet');
    expect(rerun.stderr).toBe('');
    expect(readFileSync(join(dir, 'c', 'curves.csv')).equals(first)).toBe(true);
    expect(readFileSync(join(dir, 'c', 'session.json'), 'utf8')).toBe(readFileSync(join(dir, 'a', 'session.json'), 'utf8'));
  });

  it('prints the slices without an SQS value with their reason, the flags and the correlations with their pairs', async () => {
    const run = await runCli('curves', input, ...curvesArgs, '--out', join(dir, 'd'));
    expect(run.stdout).toContain('SQS at quorum 0.5, 50 trials: 1 of 4 slices subsampled');
    expect(run.stdout).toContain('no SQS value, no occurrences: 1 slice');
    const [, second, , fourth] = readCsv(join(dir, 'a', 'curves.csv')).map((r) => r.name);
    expect(run.stdout).toContain(`no SQS value: ${second} (coverage below the quorum: Good's u 0.000), ${fourth} (coverage below the quorum: Good's u 0.000)`);
    expect(run.stdout).toContain('sampling shift: no slice flagged');
    // Slice 3 is empty, so it has no footprint: of the three steps only slice 1 → 2 pairs up,
    // and one pair gives no correlation.
    expect(run.stdout).toContain('cells: r n/a, rho n/a, n 1');
  });

  it('refuses bad curves settings by option name, value and what was expected', async () => {
    const run = await runCli('curves', input, '--quorum', '1.5', '--trials', '0', '--region-km', '20000', '--out', join(dir, 'bad'));
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('--quorum');
    expect(run.stderr).toContain('1.5');
    expect(run.stderr).toContain('a number above 0 and at most 1');
    expect(run.stderr).toContain('--trials');
    expect(run.stderr).toContain('--region-km');
  });

  it('documents every curves.csv column in the README export contract', () => {
    const readme = readFileSync(join(__dirname, '..', '..', 'README.md'), 'utf8');
    const contract = readme.slice(readme.indexOf('**`curves.csv`**'), readme.indexOf('**`regions.geojson`**'));
    for (const column of CURVES_HEADER.split(',').slice(4)) expect(contract, column).toContain(`\`${column}\``);
  });

  it('coverage does not take the curves options', async () => {
    const run = await runCli('coverage', input, '--quorum', '0.5', '--out', join(dir, 'cov'));
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('quorum');
  });
});

describe('regions.geojson', () => {
  // Two slices of twelve one-collection sites: one straddling the antimeridian on the equator, one
  // round the north pole; with the default minimum (8 cells, 10 collections) every site's region is kept.
  const rows = ['taxon,max_ma,min_ma,palaeo_lat,palaeo_lon,collection'];
  let k = 0;
  for (const lat of [0, 2, 4]) for (const lon of [177, 179, -179, -177]) rows.push(`T${k % 5},15,15,${lat},${lon},e${k++}`);
  for (const lat of [84, 86, 88]) for (const lon of [0, 90, 180, -90]) rows.push(`T${k % 5},5,5,${lat},${lon},n${k++}`);
  let collection: FeatureCollection<Polygon | MultiPolygon>;
  const radiusKm = 1500;

  beforeAll(async () => {
    const dir = tempDir('regions');
    const input = join(dir, 'regions.csv');
    writeFileSync(input, rows.join('\n'));
    const run = await runCli('curves', input, '--bins', 'equal:10', '--grid', 'healpix:32', '--region-km', String(radiusKm), '--out', join(dir, 'r'), '--quiet');
    expect(run.stderr).toBe('');
    collection = JSON.parse(readFileSync(join(dir, 'r', 'regions.geojson'), 'utf8'));
  });

  it('keeps a region per occupied cell, slice by slice, with the regions column counting them', () => {
    const bySlice = (s: number) => collection.features.filter((f) => f.properties?.slice === s).length;
    expect(bySlice(1)).toBeGreaterThanOrEqual(8);
    expect(bySlice(2)).toBeGreaterThanOrEqual(8);
  });

  it('cuts regions at the antimeridian and closes polar ones along the pole line, valid for turf (RFC 7946)', () => {
    const types = collection.features.map((f) => f.geometry.type);
    expect(types).toContain('MultiPolygon');
    const polar = collection.features.filter((f) => JSON.stringify(f.geometry.coordinates).includes(',90]'));
    expect(polar.length).toBe(collection.features.filter((f) => f.properties?.slice === 2).length);
    for (const feature of collection.features) expect(geometryProblems(feature.geometry), JSON.stringify(feature.properties)).toEqual([]);
    for (const feature of collection.features) {
      for (const ring of feature.geometry.type === 'Polygon' ? feature.geometry.coordinates : feature.geometry.coordinates.flat()) {
        for (const [lon, lat] of ring) expect(Math.abs(lon) <= 180 && Math.abs(lat) <= 90).toBe(true);
      }
    }
  });

  it('each region covers the area of its cap and holds its centre, as d3-geo reads it', () => {
    // Cap area on the unit sphere: 2π (1 − cos θ); 90 vertices inscribe it within 0.1 %.
    const theta = radiusKm / 6371.0088;
    const cap = 2 * Math.PI * (1 - Math.cos(theta));
    for (const feature of collection.features as Feature<Polygon | MultiPolygon>[]) {
      expect(d3Area(feature.geometry) / cap).toBeCloseTo(1, 2);
      const { centre_lat: lat, centre_lon: lon } = feature.properties as { centre_lat: number; centre_lon: number };
      expect(geoContains({ type: 'Feature', properties: {}, geometry: reversed(feature.geometry) }, [lon, lat])).toBe(true);
    }
  });
});

/** d3-geo reads rings clockwise (STACK.md): the written counter-clockwise rings reversed. */
function reversed(g: Polygon | MultiPolygon): Polygon | MultiPolygon {
  return g.type === 'Polygon'
    ? { type: 'Polygon', coordinates: g.coordinates.map((r) => [...r].reverse()) }
    : { type: 'MultiPolygon', coordinates: g.coordinates.map((p) => p.map((r) => [...r].reverse())) };
}
