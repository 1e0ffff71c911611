// driftgrid gaps end to end on made-up tables with known answers.
import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { geoContains } from 'd3-geo';
import type { FeatureCollection, MultiPolygon, Polygon } from 'geojson';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { d3Area, geometryProblems } from '../export/polygon-checks';
import { runCli } from './run-cli';

const NSIDE = 4;
const CELLS = 12 * NSIDE * NSIDE;
/** HEALPix cells have equal areas: 4πR²/(12·nside²) (Górski et al. 2005, ApJ 622, 759, §4). */
const R_KM = 6371.0088;
const CELL_KM2 = (4 * Math.PI * R_KM * R_KM) / CELLS;

const tempDir = (label: string) => mkdtempSync(join(tmpdir(), `driftgrid-${label}-`));
const readCsv = (path: string) => Papa.parse<Record<string, string>>(readFileSync(path, 'utf8'), { header: true, skipEmptyLines: true }).data;

/** Centres of the grid's cells, [lat, lon] degrees: where the made-up occurrences are put. */
const grid = new HealpixGrid(NSIDE);
const centres = Array.from({ length: CELLS }, (_, c) => Array.from(grid.cellCentreInto(c, new Float64Array(2))));

/**
 * Earth mover's distance between two samples on a line as ∫|F1(x) − F2(x)| dx over their
 * empirical distribution functions (Vallender 1974, Theory Probab. Appl. 18, 784), summed
 * exactly between the sorted breakpoints.
 */
function emdByCdf(a: readonly number[], b: readonly number[]): number {
  const points = [...a, ...b].sort((x, y) => x - y);
  const cdf = (sample: readonly number[], x: number) => sample.filter((v) => v <= x).length / sample.length;
  let sum = 0;
  for (let k = 0; k + 1 < points.length; k++) sum += Math.abs(cdf(a, points[k]) - cdf(b, points[k])) * (points[k + 1] - points[k]);
  return sum;
}

describe('driftgrid gaps on a made-up table', () => {
  // Slice 1 (20–10 Ma): one occurrence at the centre of every cell whose centre is at or north
  // of the equator, so the one gap is the southern part of the sphere. Slice 2 (10–0 Ma): four
  // occurrences. With --area all every cell is available.
  const north = centres.filter(([lat]) => lat >= 0);
  const south = centres.filter(([lat]) => lat < 0);
  const slice2 = [[-35, 10], [-30, 50], [20, -60], [55, 120]];
  const rows = [
    'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon',
    ...north.map(([lat, lon], k) => `T${k % 7},15,15,${lat},${lon}`),
    ...slice2.map(([lat, lon], k) => `U${k},5,5,${lat},${lon}`),
  ];
  const indicators = [
    'kind,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon',
    'coal,15,15,45,10', 'coal,14,14,47,20', 'evaporite,5,5,15,30', 'evaporite,6,6,-25,30', 'evaporite,30,30,0,0',
  ].join('\n');
  let dir: string;
  let out: string;
  let input: string;

  beforeAll(async () => {
    dir = tempDir('gaps');
    input = join(dir, 'occurrences.csv');
    writeFileSync(input, rows.join('\n'));
    writeFileSync(join(dir, 'indicators.csv'), indicators);
    out = join(dir, 'r');
    const run = await runCli(
      'gaps', input, '--area', 'all', '--bins', 'equal:10', '--grid', `healpix:${NSIDE}`, '--indicators', join(dir, 'indicators.csv'), '--out', out, '--quiet',
    );
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
  });

  it('finds the southern part of the sphere as the one gap of slice 1, with its area and centre', () => {
    const gaps = readCsv(join(out, 'gaps.csv'));
    expect(gaps.map((r) => [r.base_ma, r.top_ma])).toEqual([['20', '10'], ['10', '0']]);
    const [first] = gaps;
    expect(Number(first.available_km2)).toBeCloseTo(CELLS * CELL_KM2, 0);
    expect(Number(first.sampled_km2)).toBeCloseTo(north.length * CELL_KM2, 0);
    expect(Number(first.unsampled_km2)).toBeCloseTo(south.length * CELL_KM2, 0);
    expect(Number(first.unsampled_share)).toBeCloseTo(south.length / CELLS, 6);
    expect(first.gaps).toBe('1');
    expect(Number(first.largest_gap_km2)).toBeCloseTo(south.length * CELL_KM2, 0);
    // The southern cells are symmetric about the pole: their centre is the South Pole.
    expect(Number(first.largest_gap_lat)).toBeCloseTo(-90, 4);
    // Slice 2: four cells sampled, every other cell unsampled.
    expect(Number(gaps[1].unsampled_km2)).toBeCloseTo((CELLS - 4) * CELL_KM2, 0);
  });

  it('writes valid merged outlines whose areas are their cells\' areas, and agree with d3-geo', () => {
    const collection = JSON.parse(readFileSync(join(out, 'gaps.geojson'), 'utf8')) as FeatureCollection<Polygon | MultiPolygon>;
    const gaps = readCsv(join(out, 'gaps.csv'));
    const sums = [0, 0];
    for (const feature of collection.features) {
      const p = feature.properties as { slice: number; cells: number; area_km2: number; centre_lat: number | null };
      expect(geometryProblems(feature.geometry)).toEqual([]);
      expect(p.area_km2).toBeCloseTo(p.cells * CELL_KM2, 0);
      // d3-geo's spherical area of the outline; the cells' curved edges are drawn in short steps.
      expect(d3Area(feature.geometry) * R_KM * R_KM).toBeCloseTo(p.area_km2, -Math.log10(p.area_km2 * 0.005));
      sums[p.slice - 1] += p.area_km2;
    }
    sums.forEach((sum, s) => expect(sum).toBeCloseTo(Number(gaps[s].unsampled_km2), 0));
  });

  it('counts occurrences, cells and indicator sites per band, with shares summing to 1 and the latitude shift', () => {
    const belts = readCsv(join(out, 'belts.csv'));
    expect(belts).toHaveLength(2 * 18);
    for (const slice of ['1', '2']) {
      const of = belts.filter((r) => r.slice === slice);
      const total = (column: string) => of.reduce((sum, r) => sum + Number(r[column]), 0);
      expect(total('occurrence_share')).toBeCloseTo(1, 9);
      expect(total('occupied_share')).toBeCloseTo(1, 9);
      expect(total('available_cells')).toBe(CELLS);
    }
    const band = (slice: string, south: number) => belts.find((r) => r.slice === slice && Number(r.lat_south) === south) as Record<string, string>;
    expect(band('1', 40).sites_coal).toBe('2');
    expect(band('2', 10).sites_evaporite).toBe('1');
    expect(band('2', -30).sites_evaporite).toBe('1');
    expect(belts[0].lat_shift_deg).toBe('');
    const expected = emdByCdf(north.map(([lat]) => lat), slice2.map(([lat]) => lat));
    expect(Number(band('2', 0).lat_shift_deg)).toBeCloseTo(expected, 5);
  });

  it('reruns from its session file byte for byte', async () => {
    const again = join(dir, 'again');
    const run = await runCli('gaps', '--session', join(out, 'session.json'), '--out', again, '--quiet');
    expect(run.stderr).toBe('');
    for (const name of ['gaps.csv', 'gaps.geojson', 'belts.csv', 'session.json']) expect(readFileSync(join(again, name))).toEqual(readFileSync(join(out, name)));
    const session = JSON.parse(readFileSync(join(out, 'session.json'), 'utf8')) as { formatVersion: number; inputs: Record<string, unknown> };
    expect(session.formatVersion).toBe(4);
    expect(Object.keys(session.inputs)).toEqual(['occurrences', 'indicators']);
  });

  it('keeps only occurrences and available cells inside a fixed region, and counts the rest', async () => {
    // A box 0–90°E, 0–60°N, written anticlockwise; d3-geo reads rings clockwise, so it gets the reverse.
    const ring = [[0, 0], [90, 0], [90, 60], [0, 60], [0, 0]];
    const region = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [ring] } }] };
    writeFileSync(join(dir, 'region.geojson'), JSON.stringify(region));
    const d3Region = { type: 'Polygon' as const, coordinates: [[...ring].reverse()] };
    const inside = ([lat, lon]: number[]) => geoContains(d3Region, [lon, lat]);
    const placed = [...north, ...slice2];
    const within = join(dir, 'within');
    const run = await runCli('gaps', input, '--area', 'all', '--within', join(dir, 'region.geojson'), '--bins', 'equal:10', '--grid', `healpix:${NSIDE}`, '--out', within, '--quiet');
    expect(run.stderr).toBe('');
    const session = JSON.parse(readFileSync(join(within, 'session.json'), 'utf8')) as { summary: Record<string, unknown> };
    expect(session.summary.outsideRegion).toBe(placed.filter((p) => !inside(p)).length);
    const gaps = readCsv(join(within, 'gaps.csv'));
    const availableCells = centres.filter(inside).length;
    expect(Number(gaps[0].available_km2)).toBeCloseTo(availableCells * CELL_KM2, 0);
    expect(Number(gaps[0].sampled_km2)).toBeCloseTo(north.filter(inside).length * CELL_KM2, 0);
    // coverage takes the same region: the rows outside are not rejects.
    const coverage = join(dir, 'coverage');
    const printed = await runCli('coverage', input, '--within', join(dir, 'region.geojson'), '--bins', 'equal:10', '--grid', `healpix:${NSIDE}`, '--out', coverage);
    expect(printed.stdout).toContain(`left out of every slice: ${placed.filter((p) => !inside(p)).length}`);
    expect(readFileSync(join(coverage, 'rejects.csv'), 'utf8').trim().split('\n')).toHaveLength(1);
    const slices = readCsv(join(coverage, 'slices.csv'));
    expect(slices.reduce((sum, s) => sum + Number(s.occurrences), 0)).toBe(placed.filter(inside).length);
  });

  it('takes an area file without plate_id as given: a cell is available when its centre is inside', async () => {
    const ring = [[-40, -50], [40, -50], [40, 50], [-40, 50], [-40, -50]];
    writeFileSync(join(dir, 'land.geojson'), JSON.stringify({ type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [ring] } }));
    const d3Land = { type: 'Polygon' as const, coordinates: [[...ring].reverse()] };
    const landOut = join(dir, 'land');
    const run = await runCli('gaps', input, '--area', join(dir, 'land.geojson'), '--bins', 'equal:10', '--grid', `healpix:${NSIDE}`, '--out', landOut, '--quiet');
    expect(run.stderr).toBe('');
    const expected = centres.filter(([lat, lon]) => geoContains(d3Land, [lon, lat])).length;
    expect(Number(readCsv(join(landOut, 'gaps.csv'))[0].available_km2)).toBeCloseTo(expected * CELL_KM2, 0);
  });

  it('refuses bad input naming the file, the feature or line, the field, the value and what was expected', async () => {
    writeFileSync(join(dir, 'bad-area.geojson'), JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', geometry: { type: 'Point', coordinates: [0, 0] } }] }));
    const area = await runCli('gaps', input, '--area', join(dir, 'bad-area.geojson'), '--out', join(dir, 'x'), '--quiet');
    expect(area.status).toBe(1);
    expect(area.stderr).toContain('bad-area.geojson');
    expect(area.stderr).toContain('feature 1 geometry.type "Point": expected Polygon or MultiPolygon');
    writeFileSync(join(dir, 'bad-indicators.csv'), 'kind,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon\ncoal,15,15,45,10\n,5,5,0,0\n');
    const sites = await runCli('gaps', input, '--area', 'all', '--indicators', join(dir, 'bad-indicators.csv'), '--out', join(dir, 'y'), '--quiet');
    expect(sites.status).toBe(1);
    expect(sites.stderr).toMatch(/bad-indicators\.csv: 1 row\(s\) cannot be used:\n {2}line 3, kind: /);
    const band = await runCli('gaps', input, '--band-deg', '0', '--out', join(dir, 'z'), '--quiet');
    expect(band.stderr).toContain('--band-deg "0": expected a band width in degrees, more than 0 and at most 180');
  });
});

describe('driftgrid gaps with an area that moves with the plates', () => {
  it('makes a cell available when its centre is inside the area as rotate moves it to the slice', async () => {
    // Outside reference: d3-geo's geoContains on the polygons `rotate` writes for each slice
    // with the same model; the demo's land carries plate_id.
    const dir = tempDir('gaps-plates');
    const nside = 8;
    const demo = (name: string) => join('assets', 'demo', name);
    const moved = await runCli('rotate', demo('land.geojson'), '--rotation', demo('poles.csv'), '--bins', 'stages', '--single-file', '--out', join(dir, 'land'), '--quiet');
    expect(moved.stderr).toBe('');
    const run = await runCli(
      'gaps', demo('occurrences.csv'), '--area', demo('land.geojson'), '--rotation', demo('poles.csv'), '--bins', 'stages', '--grid', `healpix:${nside}`,
      '--out', join(dir, 'gaps'), '--quiet',
    );
    expect(run.stderr).toBe('');
    const land = JSON.parse(readFileSync(join(dir, 'land', 'land-rotated.geojson'), 'utf8')) as FeatureCollection<Polygon | MultiPolygon>;
    const cells = new HealpixGrid(nside);
    const centresAt = Array.from({ length: cells.cellCount }, (_, c) => Array.from(cells.cellCentreInto(c, new Float64Array(2))));
    const cellKm2 = (4 * Math.PI * R_KM * R_KM) / cells.cellCount;
    const gaps = readCsv(join(dir, 'gaps', 'gaps.csv'));
    const checked = gaps.filter((row) => Number(row.available_km2) > 0).slice(-3);
    expect(checked.length).toBe(3);
    for (const row of checked) {
      // d3-geo reads rings clockwise: each ring is reversed.
      const polygons = land.features.filter((f) => (f.properties as { slice: number }).slice === Number(row.slice)).map((f) => ({
        type: f.geometry.type, coordinates: f.geometry.type === 'Polygon' ? f.geometry.coordinates.map((r) => [...r].reverse()) : f.geometry.coordinates.map((p) => p.map((r) => [...r].reverse())),
      }) as Polygon | MultiPolygon);
      const inside = centresAt.filter(([lat, lon]) => polygons.some((g) => geoContains(g, [lon, lat]))).length;
      expect(Number(row.available_km2)).toBeCloseTo(inside * cellKm2, 0);
    }
  });
});
