import { createHash } from 'node:crypto';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readBinsFile, readRawRecords, readRecordsFile, readTableFile } from '../../src/cli/read-table-file';
import { InputError } from '../../src/problems';
import { ABSENT_CODE, NO_PLATE, type OccurrenceReadResult } from '../../src/table/index';
import { resolveStub } from './helpers';

const FIXTURES = join(dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const BAD = join(FIXTURES, 'bad');
const GOOD = join(FIXTURES, 'good');

const readFile = (path: string, chunkBytes?: number): Promise<OccurrenceReadResult> =>
  readTableFile(path, { resolveInterval: resolveStub, chunkBytes });

async function failure(path: string): Promise<InputError> {
  try {
    await readFile(path);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return err as InputError;
  }
  throw new Error(`${path} was read without an error`);
}

/** Byte offset of the first byte that is not ASCII, found independently of the reader. */
function firstHighByte(path: string): number {
  return readFileSync(path).findIndex((b) => b >= 0x80);
}

type Expectation =
  | { readonly error: RegExp }
  | { readonly accepted: number; readonly rejects: ReadonlyArray<readonly [line: number, field: string, reason: RegExp]> };

/** What each file in test/fixtures/bad must give; README.md in that folder says the same in words. */
const BAD_FIXTURES: Readonly<Record<string, Expectation>> = {
  'empty.csv': { error: /^line 1, header "": expected a header line naming the columns, then data rows \(the file is empty\)$/ },
  'header-only.csv': { error: /^line 2, row "": expected data rows after the header \(the file has a header but no data rows\)$/ },
  'blank-first-line.csv': { error: /^line 1, header "": expected the header naming the columns on the first line \(line 1 is blank\)$/ },
  'binary-garbage.bin': { error: /^file "binary data \(a NUL byte at offset \d+\)": expected a CSV or TSV text file$/ },
  'zip-archive.xlsx': { error: /^file "a ZIP archive \(a spreadsheet workbook is one\)": expected a CSV or TSV text file; save the sheet as CSV or TSV$/ },
  'utf16le-bom.csv': { error: /^encoding "UTF-16 text": expected UTF-8 text; save the file as UTF-8$/ },
  'utf16be-bom.csv': { error: /^encoding "UTF-16 text": expected UTF-8 text; save the file as UTF-8$/ },
  'utf16le-no-bom.csv': { error: /^encoding "UTF-16 text": expected UTF-8 text; save the file as UTF-8$/ },
  'invalid-utf8.csv': { error: /^line 3, encoding "invalid UTF-8 at byte (\d+) \(counting from 0\)": expected UTF-8 text; save the file as UTF-8$/ },
  'pipe-delimited.csv': { error: /^line 1, header "taxon\|oldest_ma\|youngest_ma\|palaeo_lat\|palaeo_lon": expected a first line naming the columns, separated by commas, tabs or semicolons .*; no usable header/ },
  'unbalanced-quote.csv': { error: /^line 3, row ""Gamma delta,.*": expected a closing quote for the quoted field that starts on this line, which is never closed/ },
  'duplicate-header.csv': { error: /^line 1, header "lat": expected one column for lat \(duplicate column name: column 4 \("lat"\) and column 6 \("lat"\) both give lat; rename or remove one\)/ },
  'ambiguous-columns.csv': { error: /^line 1, header "genus, species": expected one column for taxon \(column 1 \("genus"\) and column 2 \("species"\) both look like taxon; choose one with the mapping taxon=<column name>\)/ },
  'missing-taxon-column.csv': { error: /^line 1, header "name, oldest_ma, youngest_ma, palaeo_lat, palaeo_lon": expected a taxon column \(no taxon column; accepted names for taxon: taxon, taxon_name, / },
  'missing-age-columns.csv': { error: /^line 1, header "taxon, palaeo_lat, palaeo_lon": expected age columns: oldest_ma and youngest_ma, or interval \(no age columns; accepted names for oldest_ma: oldest_ma, / },
  'no-position-columns.csv': { error: /^line 1, header "taxon, oldest_ma, youngest_ma, collection": expected position columns: palaeo_lat and palaeo_lon, or lat and lon \(\+ plate_id\) \(no position columns; accepted names for palaeo_lat: / },
  'half-position-pair.csv': { error: /^line 1, header "taxon, oldest_ma, youngest_ma, palaeo_lat, lat, lon": expected a palaeo_lon column beside the palaeo_lat column \(accepted names for palaeo_lon: palaeo_lon, / },
  'lat-91.csv': { accepted: 1, rejects: [[3, 'palaeo_lat', /^palaeo_lat "91" is out of range; expected decimal degrees from -90 to 90$/]] },
  'lon-abc.csv': { accepted: 1, rejects: [[3, 'palaeo_lon', /^palaeo_lon "abc" is not a number; expected decimal degrees from -180 to 180$/]] },
  'lon-181.csv': { accepted: 1, rejects: [[3, 'palaeo_lon', /^palaeo_lon "181" is out of range; expected decimal degrees from -180 to 180 \(longitudes from 0 to 360/]] },
  'ages-reversed.csv': { accepted: 1, rejects: [[3, 'oldest_ma', /^oldest_ma "90" is less than youngest_ma "100"; oldest_ma is the older end of the age range/]] },
  'negative-age.csv': { accepted: 1, rejects: [[3, 'youngest_ma', /^youngest_ma "-3" is negative; expected an age in Ma before present, 0 or more$/]] },
  'older-than-earth.csv': { accepted: 2, rejects: [[3, 'oldest_ma', /^oldest_ma "5000" is older than the Earth; expected an age no older than the Earth \(4567 Ma\)$/]] },
  'half-age-value.csv': { accepted: 1, rejects: [[3, 'youngest_ma', /^youngest_ma is blank but oldest_ma is "12"; give both$/]] },
  'unknown-interval.csv': { accepted: 1, rejects: [[3, 'interval', /^interval "Jurassic Park" is not a known interval; expected a name from the built-in time chart$/]] },
  'missing-taxon-value.csv': { accepted: 1, rejects: [[3, 'taxon', /^taxon is blank; every row needs a taxon name$/]] },
  'blank-position.csv': { accepted: 1, rejects: [[3, 'palaeo_lat', /^no position: palaeo_lat, palaeo_lon, lat and lon are all blank/]] },
  'comma-decimal.csv': { accepted: 1, rejects: [[3, 'palaeo_lat', /^palaeo_lat "12,5" uses a comma; a decimal point is expected/]] },
  'too-many-fields.csv': { accepted: 1, rejects: [[3, 'row', /^record has 7 fields but the header has 6; a value containing a comma must be enclosed in double quotes$/]] },
  'too-few-fields.csv': { accepted: 1, rejects: [[3, 'row', /^record has 5 fields but the header has 6; a value is missing/]] },
  'nan-infinity.csv': {
    accepted: 1,
    rejects: [
      [3, 'palaeo_lat', /^palaeo_lat "NaN" is not a finite number/],
      [4, 'oldest_ma', /^oldest_ma "Infinity" is not a finite number/],
      [5, 'palaeo_lon', /^palaeo_lon "-Infinity" is not a finite number/],
    ],
  },
  'plate-id-not-integer.csv': { accepted: 1, rejects: [[3, 'plate_id', /^plate_id "12.5" is not a plate id; expected a whole number from 0 to 2147483647$/]] },
  'hex-number.csv': { accepted: 1, rejects: [[3, 'oldest_ma', /^oldest_ma "0x1A" is not a number; expected an age in Ma before present, 0 or more$/]] },
  'text-after-quote.csv': { accepted: 1, rejects: [[3, 'row', /^malformed quoting: field 1 has text after its closing quote/]] },
};

describe('bad fixtures', () => {
  const files = readdirSync(BAD).filter((f) => f !== 'README.md');
  const readme = readFileSync(join(BAD, 'README.md'), 'utf8');

  it('has an expectation and a README entry for every file, and a file for every expectation', () => {
    expect(files.length).toBeGreaterThanOrEqual(22);
    expect(files.sort()).toEqual(Object.keys(BAD_FIXTURES).sort());
    for (const f of files) expect(readme, f).toContain(`\`${f}\``);
  });

  for (const [file, expected] of Object.entries(BAD_FIXTURES)) {
    it(`${file}: ${'error' in expected ? 'the read fails with a clear message' : 'the bad rows are rejected with their reasons'}`, async () => {
      const path = join(BAD, file);
      if ('error' in expected) {
        expect((await failure(path)).message).toMatch(expected.error);
        return;
      }
      const result = await readFile(path);
      expect(result.table.count).toBe(expected.accepted);
      expect(result.rejects.map((r) => [r.line, r.field])).toEqual(expected.rejects.map(([line, field]) => [line, field]));
      result.rejects.forEach((r, i) => expect(r.reason).toMatch(expected.rejects[i][2]));
      const lines = readFileSync(path, 'utf8').split(/\r\n|\n|\r/);
      for (const r of result.rejects) expect(r.original).toBe(lines[r.line - 1]);
    });
  }

  it('names the byte offset of invalid UTF-8, whatever the chunk size', async () => {
    const path = join(BAD, 'invalid-utf8.csv');
    for (const chunkBytes of [undefined, 1, 2, 3, 7, 64]) {
      await expect(readFile(path, chunkBytes)).rejects.toThrow(`invalid UTF-8 at byte ${firstHighByte(path)} `);
    }
  });
});

describe('large bad files, generated at run time', () => {
  let dir = '';
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'driftgrid-table-'));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('refuses a 10 MB single line early, as not a table', async () => {
    const path = join(dir, 'single-line.csv');
    await writeFile(path, 'x,'.repeat(5 * 1024 * 1024));
    expect((await failure(path)).message).toMatch(/^line 1, row "(x,){20}…": expected a record of at most 1048576 characters; this does not look like a table with one record per line$/);
  });

  it('names the line of a quote left open across a large file', async () => {
    const path = join(dir, 'open-quote.csv');
    await writeFile(path, 'taxon,oldest_ma,youngest_ma,lat,lon\nA,1,0,1,1\n"B,1,0,1,1\n' + 'C,1,0,1,1\n'.repeat(200_000));
    expect((await failure(path)).message).toMatch(/^line 3, row ""B,1,0,1,1…": expected a closing quote \("\) within 1048576 characters: a quoted field starts on this line and is still open/);
  });
});

describe('good fixtures', () => {
  it('reads quoted fields with embedded quotes and line breaks, CRLF endings and a byte-order mark', async () => {
    const { table, rejects, columns } = await readFile(join(GOOD, 'quoted-crlf-bom.csv'));
    expect(rejects).toEqual([]);
    expect(columns.header[0]).toBe('taxon');
    expect(table.taxon.values).toEqual(['Alpha beta', 'Gamma "cf." delta', 'Epsilon']);
    expect(table.reference?.values).toEqual(['Report 12, p. 3', 'two\r\nlines']);
    expect([...(table.reference?.codes ?? [])]).toEqual([0, 1, ABSENT_CODE]);
    expect([...table.line]).toEqual([2, 3, 5]);
    expect([...table.palaeoLon]).toEqual([-40.25, -40.25, 179.999]);
  });

  it('reads a TSV with present-day positions, plate ids and an environment column', async () => {
    const { table, delimiter } = await readFile(join(GOOD, 'present-day.tsv'));
    expect(delimiter).toBe('\t');
    expect([...table.lat]).toEqual([45.5, -10, 45.5]);
    expect([...table.plateId]).toEqual([101, NO_PLATE, 101]);
    expect([...table.oldestMa]).toEqual([150, 100, 150]);
    expect([...table.youngestMa]).toEqual([145, 0.5, 145]);
    expect([...table.taxon.codes]).toEqual([0, 1, 0]);
    expect([...(table.environment?.codes ?? [])]).toEqual([0, ABSENT_CODE, 0]);
  });

  it('reads interval names, and numbers where a row gives both', async () => {
    const { table } = await readFile(join(GOOD, 'intervals.csv'));
    expect([...table.oldestMa]).toEqual([121.4, 113.0, 130]);
    expect([...table.youngestMa]).toEqual([113.0, 100.5, 125]);
  });

  it('recognises headers written with synonyms, case and separators', async () => {
    const { table, columns } = await readFile(join(GOOD, 'synonym-headers.csv'));
    expect(columns.index).toMatchObject({ taxon: 0, oldest_ma: 1, youngest_ma: 2, palaeo_lat: 3, palaeo_lon: 4, collection: 5, group: 6 });
    expect(table.count).toBe(2);
    expect(table.group?.values).toEqual(['Beta group']);
  });

  it('reads a file with old-style CR line endings', async () => {
    const { table } = await readFile(join(GOOD, 'cr-line-endings.csv'));
    expect([...table.line]).toEqual([2, 3]);
    expect(table.taxon.values).toEqual(['Alpha beta', 'Gamma delta']);
  });

  it('gives the same result whatever the read chunk size', async () => {
    for (const file of readdirSync(GOOD)) {
      const whole = await readFile(join(GOOD, file));
      for (const chunkBytes of [1, 3, 17]) expect(await readFile(join(GOOD, file), chunkBytes)).toEqual(whole);
    }
  });

  it('leaves the input file exactly as it was: same bytes, same modification time', async () => {
    for (const file of readdirSync(GOOD)) {
      const path = join(GOOD, file);
      const before = statSync(path);
      const hash = createHash('sha256').update(readFileSync(path)).digest('hex');
      await readFile(path);
      const after = statSync(path);
      expect(after.mtimeMs).toBe(before.mtimeMs);
      expect(after.size).toBe(before.size);
      expect(createHash('sha256').update(readFileSync(path)).digest('hex')).toBe(hash);
    }
  });

  it('says when the file cannot be opened', async () => {
    await expect(readFile(join(GOOD, 'no-such-file.csv'))).rejects.toThrow(/^file ".*no-such-file\.csv": expected a file that can be read \(ENOENT/);
  });
});

describe('other readers at the file boundary', () => {
  it('re-reads the raw text of records starting on given lines', async () => {
    const raw = await readRawRecords(join(GOOD, 'quoted-crlf-bom.csv'), new Set([3, 5, 99]));
    expect([...raw.entries()]).toEqual([
      [3, '"Gamma ""cf."" delta",100.5,94,12.5,-40.25,C1,"two\r\nlines"'],
      [5, '  Epsilon  ,66,66,-89.5,179.999,,'],
    ]);
  });

  it('reads every record of a small table as strings, counting blank lines', async () => {
    const { header, records, blankLines } = await readRecordsFile(join(GOOD, 'present-day.tsv'));
    expect(header[0]).toBe('taxon');
    expect(records.map((r) => [r.line, r.fields[0]])).toEqual([[2, 'Alpha beta'], [3, 'Gamma delta'], [4, 'Alpha beta']]);
    expect(blankLines).toBe(0);
    await expect(readRecordsFile(join(BAD, 'utf16le-bom.csv'))).rejects.toThrow(/UTF-16/);
  });

  it('reads a bin table into a time scale', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'driftgrid-bins-'));
    try {
      const path = join(dir, 'bins.csv');
      await writeFile(path, 'name,base_ma,top_ma\nOlder,20,10\nYounger,10,0\n');
      const scale = await readBinsFile(path);
      expect(scale.names).toEqual(['Older', 'Younger']);
      expect([...scale.baseMa]).toEqual([20, 10]);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
