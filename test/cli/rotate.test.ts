import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { geoArea, geoContains } from 'd3-geo';
import { booleanClockwise } from '@turf/turf';
import type { FeatureCollection, MultiPolygon, Polygon, Position } from 'geojson';
import { chartScale } from '../../src/time';
import { angleBetweenDeg, unit } from '../rotation/rodrigues';
import { runCli } from './run-cli';

const tempDir = (label: string) => mkdtempSync(join(tmpdir(), `driftgrid-${label}-`));
const readCsv = (path: string) => Papa.parse<Record<string, string>>(readFileSync(path, 'utf8'), { header: true, skipEmptyLines: true }).data;
const readJson = <T>(path: string): T => JSON.parse(readFileSync(path, 'utf8')) as T;
const POLES = 'assets/demo/poles.csv';
const LAND = 'assets/demo/land.geojson';
/** The demo model reaches back to 300 Ma for every plate (assets/demo/README.md). */
const DEMO_REACH_MA = 300;

const polygonsOf = (g: Polygon | MultiPolygon): Position[][][] => (g.type === 'Polygon' ? [g.coordinates] : g.coordinates);
/** d3-geo reads a ring clockwise around its area, the reverse of RFC 7946 (STACK.md): rewind. */
const d3Polygons = (g: Polygon | MultiPolygon): Polygon[] => polygonsOf(g).map((rings) => ({ type: 'Polygon', coordinates: rings.map((r) => [...r].reverse()) }));
const d3Area = (g: Polygon | MultiPolygon) => d3Polygons(g).reduce((sum, p) => sum + geoArea(p), 0);

/** The demo table without its palaeo_lat and palaeo_lon columns (4th and 5th; the file holds no quotes). */
function demoWithoutPalaeo(dir: string): string {
  const path = join(dir, 'sites.csv');
  const lines = readFileSync('assets/demo/occurrences.csv', 'utf8').trimEnd().split('\n');
  writeFileSync(path, lines.map((l) => l.split(',').filter((_, i) => i !== 3 && i !== 4).join(',')).join('\n') + '\n');
  return path;
}

describe('driftgrid rotate on the demo table', () => {
  let dir: string;
  let input: string;
  beforeAll(async () => {
    dir = tempDir('rotate-table');
    input = demoWithoutPalaeo(dir);
    const run = await runCli('rotate', input, '--rotation', POLES, '--rotate-at', 'occurrence', '--out', join(dir, 'r'));
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/rotated with assets\/demo\/poles\.csv to each row's own age: 49,906\n/);
  });

  it('writes every record back as it was, with palaeo_lat, palaeo_lon and placed_at_ma appended', () => {
    const before = readFileSync(input, 'utf8').split('\n');
    const after = readFileSync(join(dir, 'r', 'sites-rotated.csv'), 'utf8').split('\n');
    expect(after.length).toBe(before.length);
    expect(after[0]).toBe(`${before[0]},palaeo_lat,palaeo_lon,placed_at_ma`);
    const altered = after.slice(1, -1).filter((line, k) => !line.startsWith(`${before[k + 1]},`) || line.slice(before[k + 1].length).split(',').length !== 4);
    expect(altered).toEqual([]);
    expect(after[after.length - 1]).toBe('');
  });

  // Issue 3, part 5, row by row. Reference: the palaeocoordinates the demo generator wrote (checked
  // in test/demo against a Rodrigues rotation-matrix reading of poles.csv), each site at its age
  // midpoint; both columns are rounded to 4 decimals, so they agree to better than 1e-3°.
  it('places every site where the demo generator placed it, at its age midpoint', () => {
    const original = readCsv('assets/demo/occurrences.csv');
    const rows = readCsv(join(dir, 'r', 'sites-rotated.csv'));
    let worst = 0;
    rows.forEach((r, k) => {
      const o = original[k];
      expect(Number(r.placed_at_ma)).toBeCloseTo((Number(o.oldest_ma) + Number(o.youngest_ma)) / 2, 6);
      worst = Math.max(worst, angleBetweenDeg(unit(Number(r.palaeo_lat), Number(r.palaeo_lon)), unit(Number(o.palaeo_lat), Number(o.palaeo_lon))));
    });
    expect(worst).toBeLessThan(1e-3);
    expect(readCsv(join(dir, 'r', 'rejects.csv'))).toEqual([]);
  });

  it('refuses a table that already has a column of an appended name', async () => {
    const run = await runCli('rotate', 'assets/demo/occurrences.csv', '--rotation', POLES, '--out', tempDir('clash'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/occurrences\.csv: column 4 \("palaeo_lat"\) and column 5 \("palaeo_lon"\) have the name of a column rotate appends/);
  });
});

describe('driftgrid rotate on a table written in an unusual way', () => {
  // A semicolon-delimited file with a byte-order mark and CRLF endings, quoted fields holding the
  // delimiter, doubled quotes and a line break, a blank line, a record with too few fields, a row
  // without a plate and one whose plate is not in the model.
  const lines = [
    'name;oldest_ma;youngest_ma;lat;lon;plate_id;note',
    '"Alpha; beta";150;145;45.5;-120.25;101;"said ""here"""',
    '',
    'Gamma;10;5;-10;20;;plain',
    'Delta;10;5;0;0;101;"two\r\nlines"',
    'Epsilon;10;5;0',
    'Zeta;10;5;1.50;2.250;999;  spaced  ',
  ];
  const text = '\ufeff' + lines.join('\r\n') + '\r\n';
  let dir: string;
  let out: string[];
  beforeAll(async () => {
    dir = tempDir('rotate-odd');
    writeFileSync(join(dir, 'odd.csv'), text);
    const run = await runCli('rotate', join(dir, 'odd.csv'), '--rotation', POLES, '--map', 'taxon=name', '--rotate-at', 'occurrence', '--out', join(dir, 'r'), '--quiet');
    expect(run.stderr).toBe('');
    out = readFileSync(join(dir, 'r', 'odd-rotated.csv'), 'utf8').slice(1).split('\r\n');
  });

  it('keeps the byte-order mark, the delimiter, the line endings and every field byte for byte', () => {
    expect(readFileSync(join(dir, 'r', 'odd-rotated.csv'), 'utf8').startsWith('\ufeff')).toBe(true);
    const records = [lines[0], lines[1], lines[2], lines[3], 'Delta;10;5;0;0;101;"two', 'lines"', lines[5], lines[6], ''];
    expect(out.length).toBe(records.length);
    expect(out[0]).toBe(`${lines[0]};palaeo_lat;palaeo_lon;placed_at_ma`);
    expect(out[1]).toMatch(/^"Alpha; beta";150;145;45\.5;-120\.25;101;"said ""here""";-?\d+\.\d{6};-?\d+\.\d{6};147\.5$/);
    expect(out[2]).toBe(''); // the blank line stays, so line numbers match the input's
    expect(out[3]).toBe('Gamma;10;5;-10;20;;plain;;;');
    expect(out[4]).toBe('Delta;10;5;0;0;101;"two');
    expect(out[5]).toMatch(/^lines";-?\d+\.\d{6};-?\d+\.\d{6};7\.5$/);
    expect(out[6]).toBe('Epsilon;10;5;0;;;');
    expect(out[7]).toBe('Zeta;10;5;1.50;2.250;999;  spaced  ;;;');
  });

  it('lists each row it could not place in rejects.csv, by line, with the reason', () => {
    const rejects = readCsv(join(dir, 'r', 'rejects.csv'));
    expect(rejects.map((r) => [r.line, r.field])).toEqual([['4', 'plate_id'], ['7', 'row'], ['8', 'plate_id']]);
    expect(rejects[2].reason).toMatch(/^plate_id 999 is not in the rotation model assets\/demo\/poles\.csv; expected one of its plates \(101, 201, 301, 401, 501, 601; fixed plate 0\)$/);
  });
});

describe('driftgrid rotate on the demo land polygons', () => {
  const stages = chartScale('stages');
  const mid = (s: number) => 0.5 * (stages.baseMa[s] + stages.topMa[s]);
  const reached = stages.names.map((_, s) => s).filter((s) => mid(s) <= DEMO_REACH_MA);
  const land = readJson<FeatureCollection<Polygon, Record<string, unknown>>>(LAND).features;
  let dir: string;
  let files: string[];
  beforeAll(async () => {
    dir = tempDir('rotate-land');
    const run = await runCli('rotate', LAND, '--rotation', POLES, '--bins', 'stages', '--out', join(dir, 'r'));
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    files = readdirSync(join(dir, 'r')).filter((f) => f.endsWith('.geojson')).sort();
  });

  it('writes one FeatureCollection per slice, named by number and slice name', () => {
    expect(files.length).toBe(stages.names.length);
    expect(files[0]).toBe('slice-001-fortunian.geojson');
    expect(files[stages.names.length - 1]).toBe('slice-102-meghalayan.geojson');
  });

  it('keeps every feature in the slices the model reaches, and lists each left-out feature in rotate-notes.csv', () => {
    const counts = files.map((f) => readJson<FeatureCollection>(join(dir, 'r', f)).features.length);
    expect(counts).toEqual(stages.names.map((_, s) => (reached.includes(s) ? land.length : 0)));
    const notes = readCsv(join(dir, 'r', 'rotate-notes.csv'));
    expect(notes.length).toBe(land.length * (stages.names.length - reached.length));
    expect(notes[0]).toEqual({
      feature: '1', plate_id: '101', slice: '1', slice_name: 'Fortunian', placed_at_ma: '533.9',
      note: `left out: the slice's mid-age 533.9 Ma is older than ${POLES} reaches for plate 101 (back to 300 Ma); --beyond-model clamp would place it as at 300 Ma`,
    });
  });

  // Reference: d3-geo's geoArea (great-circle edges) on rings rewound into d3's order. A rigid
  // rotation preserves area, so every reconstructed outline measures what it does today; outlines
  // are written to 6 decimals (about 0.1 m), hence the 1e-6 relative tolerance.
  it('carries every polygon rigidly: each slice keeps the present-day areas', () => {
    for (const s of reached) {
      const features = readJson<FeatureCollection<Polygon | MultiPolygon>>(join(dir, 'r', files[s])).features;
      features.forEach((f, k) => {
        const today = d3Area(land[k].geometry);
        expect(Math.abs(d3Area(f.geometry) - today) / today).toBeLessThan(1e-6);
      });
    }
  });

  // Reference: @turf/turf's booleanClockwise for RFC 7946 ring order (§3.1.6: exteriors
  // anticlockwise), and the coordinate ranges of §3.1.9 (cut at the antimeridian).
  it('writes valid RFC 7946 rings: closed, anticlockwise exteriors, positions within range', () => {
    for (const s of reached) {
      for (const f of readJson<FeatureCollection<Polygon | MultiPolygon>>(join(dir, 'r', files[s])).features) {
        for (const rings of polygonsOf(f.geometry)) {
          expect(booleanClockwise(rings[0])).toBe(false);
          for (const ring of rings) {
            expect(ring[0]).toEqual(ring[ring.length - 1]);
            expect(ring.every(([lon, lat]) => Math.abs(lon) <= 180 && Math.abs(lat) <= 90)).toBe(true);
          }
        }
      }
    }
  });

  // Points and polygons on one reconstruction: every demo site lies inside its landmass today, so
  // at a slice's mid-age each reconstructed site must lie inside its reconstructed landmass
  // (d3-geo's geoContains, great-circle reading).
  it('puts each site reconstructed at the slice mid-age inside its landmass reconstructed for that slice', async () => {
    const sites = demoWithoutPalaeo(dir);
    expect((await runCli('rotate', sites, '--rotation', POLES, '--bins', 'stages', '--out', join(dir, 'sites'), '--quiet')).status).toBe(0);
    const rows = readCsv(join(dir, 'sites', 'sites-rotated.csv'));
    const cache = new Map<string, Map<number, Polygon[]>>();
    const landAt = (file: string) => {
      if (!cache.has(file)) {
        const features = readJson<FeatureCollection<Polygon | MultiPolygon>>(join(dir, 'r', file)).features;
        cache.set(file, new Map(features.map((f) => [Number(f.properties?.plate_id), d3Polygons(f.geometry)])));
      }
      return cache.get(file) as Map<number, Polygon[]>;
    };
    let checked = 0;
    for (const r of rows) {
      const age = Number(r.placed_at_ma);
      const s = reached.find((k) => Math.abs(mid(k) - age) < 1e-9);
      expect(s).toBeDefined();
      const parts = landAt(files[s as number]).get(Number(r.plate_id)) ?? [];
      expect(parts.some((p) => geoContains(p, [Number(r.palaeo_lon), Number(r.palaeo_lat)]))).toBe(true);
      checked++;
    }
    expect(checked).toBe(49906);
  });

  it('with --single-file writes one FeatureCollection with slice, slice_name and placed_at_ma on every feature', async () => {
    const out = join(dir, 'single');
    expect((await runCli('rotate', LAND, '--rotation', POLES, '--single-file', '--out', out, '--quiet')).status).toBe(0);
    const features = readJson<FeatureCollection<Polygon | MultiPolygon, Record<string, unknown>>>(join(out, 'land-rotated.geojson')).features;
    expect(features.length).toBe(land.length * reached.length);
    const first = features[0].properties;
    const s = reached[0];
    expect(first).toEqual({ plate_id: 101, name: 'Zisdridavar', slice: s + 1, slice_name: stages.names[s], placed_at_ma: Number(mid(s).toFixed(6)) });
    expect(readdirSync(out).sort()).toEqual(['land-rotated.geojson', 'rotate-notes.csv']);
  });

  it('with --beyond-model clamp keeps every feature in every slice and notes each clamped one', async () => {
    const out = join(dir, 'clamp');
    const run = await runCli('rotate', LAND, '--rotation', POLES, '--bins', 'periods', '--beyond-model', 'clamp', '--out', out);
    const periods = chartScale('periods');
    const clamped = periods.names.filter((_, s) => 0.5 * (periods.baseMa[s] + periods.topMa[s]) > DEMO_REACH_MA).length;
    expect(run.stdout).toMatch(new RegExp(`rotated with .*: ${land.length * periods.names.length} feature-slices \\(${land.length * clamped} clamped`));
    const notes = readCsv(join(out, 'rotate-notes.csv'));
    expect(notes.length).toBe(land.length * clamped);
    expect(notes.every((n) => n.note.startsWith('clamped: reconstructed at 300 Ma') && n.placed_at_ma === '300')).toBe(true);
  });
});

describe('rotate inputs and options that cannot be used', () => {
  const geojson = (features: unknown[]) => {
    const path = join(tempDir('geo'), 'in.geojson');
    writeFileSync(path, JSON.stringify({ type: 'FeatureCollection', features }));
    return path;
  };
  const square = [[[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]]];

  it('leaves a polygon whose plate is not in the model out of every slice, and says so', async () => {
    const path = geojson([{ type: 'Feature', properties: { plate_id: 999 }, geometry: { type: 'Polygon', coordinates: square } }]);
    const out = join(tempDir('unknown-plate'), 'r');
    const run = await runCli('rotate', path, '--rotation', POLES, '--bins', 'periods', '--out', out);
    expect(run.stdout).toMatch(/rotated with .*: 0 feature-slices; left out: 12 \(see rotate-notes\.csv\)/);
    const notes = readCsv(join(out, 'rotate-notes.csv'));
    expect(notes.length).toBe(12);
    expect(notes[0].note).toBe(`left out: plate 999 is not in the rotation model ${POLES}`);
  });

  it.each([
    [['rotate', 'assets/demo/occurrences.csv'], /rotate needs a rotation model: add --rotation <poles\.csv>\./],
    [['rotate', '--rotation', POLES], /rotate takes one input, a table or a GeoJSON file; got none/],
    [['rotate', 'test/fixtures/good/present-day.tsv', '--rotation', POLES, '--single-file'], /--single-file applies to GeoJSON input/],
    [['rotate', LAND, '--rotation', POLES, '--rotate-at', 'occurrence'], /--rotate-at applies to tables; assets\/demo\/land\.geojson is GeoJSON/],
    [['rotate', LAND, '--rotation', POLES, '--prefer-model'], /Unknown option '--prefer-model'/],
    [['rotate', 'assets/demo/poles.geojson', '--rotation', POLES], /assets\/demo\/poles\.geojson: cannot read it/],
    [['rotate', 'test/fixtures/bad/empty.csv', '--rotation', POLES], /empty\.csv: line 1, header "": expected a header line naming the columns, then data rows \(the file is empty\)/],
    [['reconstruct', LAND, '--rotation', POLES], /^driftgrid: Unknown command "reconstruct"\. Commands: coverage, curves, gaps, rotate\. See `driftgrid --help`\.\n$/],
  ])('%j is refused with a message saying what was expected', async (args, message) => {
    const run = await runCli(...args, '--out', tempDir('rotate-opt'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(message);
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });

  it('refuses GeoJSON that is not polygons with a plate_id, listing every feature at fault', async () => {
    const path = geojson([
      { type: 'Feature', properties: { plate_id: 101 }, geometry: { type: 'Point', coordinates: [0, 0] } },
      { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: square } },
    ]);
    const run = await runCli('rotate', path, '--rotation', POLES, '--out', tempDir('bad-geo'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/in\.geojson, feature 1 geometry type "Point": expected Polygon or MultiPolygon/);
    expect(run.stderr).toMatch(/in\.geojson, feature 2 plate_id "": expected a property plate_id, a whole number from 0 to 2147483647 \(plate_id is missing\)/);
  });

  it('refuses a file that is not JSON', async () => {
    const path = join(tempDir('notjson'), 'land.geojson');
    writeFileSync(path, 'plate_id,lat\n1,2\n');
    const run = await runCli('rotate', path, '--rotation', POLES, '--out', tempDir('notjson-out'));
    expect(run.stderr).toMatch(/land\.geojson: not JSON \(.*\); expected a GeoJSON FeatureCollection/);
  });

  it('never writes over an input, even when --out is its folder', async () => {
    const dir = tempDir('rotate-overwrite');
    const poles = join(dir, 'rejects.csv');
    writeFileSync(poles, readFileSync(POLES));
    const run = await runCli('rotate', 'test/fixtures/good/present-day.tsv', '--rotation', poles, '--out', dir);
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/Refusing to write .*rejects\.csv: it is one of the input files/);
    expect(readFileSync(poles, 'utf8')).toBe(readFileSync(POLES, 'utf8'));
  });
});
