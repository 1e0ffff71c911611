import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { runCli } from './run-cli';

const tempDir = (label: string) => mkdtempSync(join(tmpdir(), `driftgrid-${label}-`));
const readCsv = (path: string) => Papa.parse<Record<string, string>>(readFileSync(path, 'utf8'), { header: true, skipEmptyLines: true }).data;
const DEMO = 'assets/demo/occurrences.csv';
const POLES = 'assets/demo/poles.csv';

/** The demo table without its palaeo_lat and palaeo_lon columns (the 4th and 5th): present-day
 * lat/lon + plate_id only. The demo files hold no quotes, so splitting on commas is exact. */
function demoWithoutPalaeo(dir: string): string {
  const path = join(dir, 'present-day.csv');
  const lines = readFileSync(DEMO, 'utf8').trimEnd().split('\n');
  writeFileSync(path, lines.map((l) => l.split(',').filter((_, i) => i !== 3 && i !== 4).join(',')).join('\n') + '\n');
  return path;
}

// Issue 3, part 5. Reference: the demo generator placed every site at its age midpoint and wrote
// the palaeocoordinates into the table, rounded to 4 decimals; test/demo checks those against an
// independent rotation-matrix (Rodrigues) reading of poles.csv. Reconstructing the present-day
// columns (also rounded to 4 decimals, about 11 m) must give the same footprint: the same counts
// per slice, and latitude ranges within the 1e-3° the two roundings allow (assets/demo/README.md).
describe('coverage of the demo with present-day positions and the demo rotation model', () => {
  let dir: string;
  let given: Array<Record<string, string>>;
  beforeAll(async () => {
    dir = tempDir('demo-rotation');
    expect((await runCli('coverage', DEMO, '--out', join(dir, 'given'), '--quiet')).status).toBe(0);
    given = readCsv(join(dir, 'given', 'slices.csv'));
  });

  const expectSameFootprint = (rows: Array<Record<string, string>>) => {
    expect(rows.length).toBe(given.length);
    rows.forEach((s, k) => {
      const g = given[k];
      expect([s.name, s.occurrences, s.collections, s.taxa, s.cells]).toEqual([g.name, g.occurrences, g.collections, g.taxa, g.cells]);
      if (g.lat_min === '') return;
      expect(Math.abs(Number(s.lat_min) - Number(g.lat_min))).toBeLessThan(1e-3);
      expect(Math.abs(Number(s.lat_max) - Number(g.lat_max))).toBeLessThan(1e-3);
    });
  };

  it('gives the footprint of the table palaeocoordinates when a copy without them is reconstructed at each row age', async () => {
    const run = await runCli('coverage', demoWithoutPalaeo(dir), '--rotation', POLES, '--rotate-at', 'occurrence', '--out', join(dir, 'model'));
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/placed from the table's palaeocoordinates: 0; by the rotation model assets\/demo\/poles\.csv: 49,906\n/);
    expectSameFootprint(readCsv(join(dir, 'model', 'slices.csv')));
    expect(readCsv(join(dir, 'model', 'rejects.csv'))).toEqual([]);
  });

  it('gives the same footprint from the original table with --prefer-model', async () => {
    const run = await runCli('coverage', DEMO, '--rotation', POLES, '--rotate-at', 'occurrence', '--prefer-model', '--out', join(dir, 'prefer'), '--quiet');
    expect(run.status).toBe(0);
    expectSameFootprint(readCsv(join(dir, 'prefer', 'slices.csv')));
  });

  it('uses the table palaeocoordinates when they are present and --prefer-model is not given', async () => {
    const run = await runCli('coverage', DEMO, '--rotation', POLES, '--out', join(dir, 'table-first'));
    expect(run.stdout).toMatch(/placed from the table's palaeocoordinates: 49,906; by the rotation model assets\/demo\/poles\.csv: 0\n/);
    expect(readFileSync(join(dir, 'table-first', 'slices.csv'), 'utf8')).toBe(readFileSync(join(dir, 'given', 'slices.csv'), 'utf8'));
  });
});

describe('coverage with a rotation model on a small table', () => {
  // Plate 1 turns about the pole (0°N, 0°E) by 30° at 100 Ma, so by 0.3°/Myr about the x axis
  // (slerp about one axis interpolates the angle linearly): the site (0°N, 90°E) is at latitude
  // 0.3·t at age t, longitude 90° (rotation about the x axis by Rodrigues' formula, closed form).
  const poles = 'plate_id,age_ma,pole_lat,pole_lon,angle_deg,relative_to\n1,0,90,0,0,0\n1,100,0,0,30,0\n';
  const table = [
    'taxon,oldest_ma,youngest_ma,lat,lon,plate_id',
    'Alpha,40,20,0,90,1', // slice 50–0 Ma, mid-age 25: 7.5°N
    'Beta,170,160,0,90,1', // slice 200–150 Ma (equal bins reach the oldest age), mid-age 175: beyond 100 Ma
    'Gamma,40,20,0,90,999',
    'Delta,40,20,0,90,',
  ].join('\n');
  let dir: string;
  beforeAll(() => {
    dir = tempDir('small-rotation');
    writeFileSync(join(dir, 'poles.csv'), poles);
    writeFileSync(join(dir, 'sites.csv'), table);
  });
  const run = (out: string, ...extra: string[]) =>
    runCli('coverage', join(dir, 'sites.csv'), '--rotation', join(dir, 'poles.csv'), '--bins', 'equal:50', '--grid', 'healpix:4', '--out', join(dir, out), ...extra);

  it('rotates to the slice mid-age and lists rows it cannot place in rejects.csv with plate and age', async () => {
    const result = await run('reject');
    expect(result.status).toBe(0);
    const slices = readCsv(join(dir, 'reject', 'slices.csv'));
    const young = slices[slices.length - 1];
    expect([young.occurrences, young.lat_min, young.centroid_lon]).toEqual(['1', '7.500000', '90.000000']);
    const rejects = readCsv(join(dir, 'reject', 'rejects.csv'));
    expect(rejects.map((r) => [r.line, r.field, r.reason])).toEqual([
      ['3', 'age', `the slice's mid-age 175 Ma is older than ${join(dir, 'poles.csv')} reaches for plate 1 (back to 100 Ma, chain 1 → 0); expected an age of at most 100 Ma, or --beyond-model clamp`],
      ['4', 'plate_id', `plate_id 999 is not in the rotation model ${join(dir, 'poles.csv')}; expected one of its plates (1; fixed plate 0)`],
      ['5', 'plate_id', 'no plate_id, so the present-day lat/lon cannot be reconstructed; expected a plate id of the rotation model'],
    ]);
    expect(rejects[0].original).toBe('Beta,170,160,0,90,1');
    expect(result.stdout).toMatch(/placed from the table's palaeocoordinates: 0; by the rotation model .*poles\.csv: 1\n/);
    expect(result.stdout).toMatch(/not placed, older than the rotation model reaches for its plate; .*: 1\n/);
    expect(result.stdout).toMatch(/not placed, plate_id not in the rotation model; expected one of its plates: 1\n/);
  });

  it('with --beyond-model clamp places the old row as at the oldest age the model reaches, and counts it', async () => {
    const result = await run('clamp', '--beyond-model', 'clamp');
    expect(result.stdout).toMatch(/by the rotation model .*poles\.csv: 2 \(1 clamped to the oldest age the model reaches for their plate\)/);
    const old = readCsv(join(dir, 'clamp', 'slices.csv')).find((s) => s.base_ma === '200');
    expect([old?.occurrences, old?.lat_min]).toEqual(['1', '30.000000']); // 0.3°/Myr × 100 Myr
    expect(readCsv(join(dir, 'clamp', 'rejects.csv')).map((r) => r.line)).toEqual(['4', '5']);
    expect(JSON.parse(readFileSync(join(dir, 'clamp', 'session.json'), 'utf8')).summary.clampedByModel).toBe(1);
  });

  it('records the rotation file and settings in session.json, and a rerun reproduces every CSV byte for byte', async () => {
    await run('recorded', '--rotate-at', 'occurrence', '--beyond-model', 'clamp', '--quiet');
    const session = JSON.parse(readFileSync(join(dir, 'recorded', 'session.json'), 'utf8'));
    const sha = execFileSync('sha256sum', [join(dir, 'poles.csv')], { encoding: 'utf8' }).split(' ')[0];
    expect(session.formatVersion).toBe(3);
    expect(session.inputs.rotation).toEqual({ path: '../poles.csv', sha256: sha, bytes: Buffer.byteLength(poles) });
    expect(session.settings).toMatchObject({ rotateAt: 'occurrence', preferModel: false, beyondModel: 'clamp' });
    const again = await runCli('coverage', '--session', join(dir, 'recorded', 'session.json'), '--out', join(dir, 'again'), '--quiet');
    expect(again.status).toBe(0);
    for (const name of ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv']) {
      expect(readFileSync(join(dir, 'again', name), 'utf8')).toBe(readFileSync(join(dir, 'recorded', name), 'utf8'));
    }
  });

  it('refuses to rerun a session whose rotation model has changed since', async () => {
    const copy = tempDir('changed-poles');
    writeFileSync(join(copy, 'poles.csv'), poles);
    await runCli('coverage', join(dir, 'sites.csv'), '--rotation', join(copy, 'poles.csv'), '--out', join(copy, 'r'), '--quiet');
    writeFileSync(join(copy, 'poles.csv'), poles.replace('30,0', '31,0'));
    const rerun = await runCli('coverage', '--session', join(copy, 'r', 'session.json'), '--out', join(copy, 'again'));
    expect(rerun.status).toBe(1);
    expect(rerun.stderr).toMatch(/poles\.csv has changed since the session was recorded/);
  });

  it('reruns a session file of format 1 (no rotation model) as before', async () => {
    const out = join(dir, 'v1');
    await runCli('coverage', 'test/fixtures/good/synonym-headers.csv', '--out', out, '--quiet');
    const session = JSON.parse(readFileSync(join(out, 'session.json'), 'utf8'));
    const { rotateAt: _r, preferModel: _p, beyondModel: _b, ...settings } = session.settings;
    writeFileSync(join(out, 'v1.json'), JSON.stringify({ ...session, formatVersion: 1, settings }));
    expect((await runCli('coverage', '--session', join(out, 'v1.json'), '--out', join(dir, 'v1-again'), '--quiet')).status).toBe(0);
    expect(readFileSync(join(dir, 'v1-again', 'slices.csv'), 'utf8')).toBe(readFileSync(join(out, 'slices.csv'), 'utf8'));
  });
});

describe('rotation options and files that cannot be used', () => {
  const table = 'test/fixtures/good/present-day.tsv';
  const poleFile = (text: string) => {
    const path = join(tempDir('poles'), 'poles.csv');
    writeFileSync(path, text);
    return path;
  };
  const HEADER = 'plate_id,age_ma,pole_lat,pole_lon,angle_deg,relative_to\n';

  it.each([
    ['a pole latitude beyond 90', `${HEADER}1,0,90,0,0,0\n1,10,95,0,5,0\n`, /poles\.csv cannot be used as a rotation model:\n.*poles\.csv line 3, pole_lat "95": expected a latitude from -90 to 90 degrees/],
    ['a missing column', 'plate_id,age_ma,pole_lat,pole_lon,angle_deg\n1,0,90,0,0\n', /poles\.csv line 1, relative_to "": expected a column named relative_to in the header/],
    ['two plates moving relative to each other', `${HEADER}1,10,0,0,5,2\n2,10,0,0,5,1\n3,10,0,0,5,0\n`, /1 → 2 → 1/],
    ['an empty file', '', /poles\.csv: line 1, header "": expected a header line naming the columns \(the file is empty\)/],
  ])('refuses a rotation model with %s, naming the file, line and field', async (_what, text, message) => {
    const path = poleFile(text);
    const run = await runCli('coverage', table, '--rotation', path, '--out', tempDir('bad-poles'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(message);
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });

  it.each([
    [['--rotation', 'assets/demo/poles.csv', '--rotate-at', 'age'], /--rotate-at "age": expected slice or occurrence$/m],
    [['--rotation', 'assets/demo/poles.csv', '--beyond-model', 'ignore'], /--beyond-model "ignore": expected reject or clamp$/m],
    [['--prefer-model'], /--prefer-model needs a rotation model: add --rotation <poles\.csv>\./],
    [['--rotate-at', 'slice', '--beyond-model', 'clamp'], /--rotate-at, --beyond-model need a rotation model/],
    [['--rotation', 'no-such-poles.csv'], /no-such-poles\.csv: file "no-such-poles\.csv": expected a file that can be read \(ENOENT/],
  ])('refuses coverage %j with a message saying what was expected', async (args, message) => {
    const run = await runCli('coverage', table, ...args, '--out', tempDir('opt'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(message);
  });

  it('refuses --rotation beside --session, which fixes it', async () => {
    const run = await runCli('coverage', '--session', 'x.json', '--rotation', 'assets/demo/poles.csv');
    expect(run.stderr).toMatch(/--session fixes the input table and the settings; leave out --rotation/);
  });
});
