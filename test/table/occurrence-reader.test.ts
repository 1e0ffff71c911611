import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ABSENT_CODE, NO_PLATE, createOccurrenceReader, type OccurrenceReadResult, type OccurrenceReaderOptions,
} from '../../src/table/index';
import { cut, resolveStub } from './helpers';

function read(text: string | string[], options: Partial<OccurrenceReaderOptions> = {}): OccurrenceReadResult {
  const reader = createOccurrenceReader({ resolveInterval: resolveStub, ...options });
  for (const piece of typeof text === 'string' ? [text] : text) reader.push(piece);
  return reader.end();
}

const HEADER = 'taxon,oldest_ma,youngest_ma,palaeo_lat,palaeo_lon,lat,lon,plate_id,collection,interval\n';

/** The single reject of a one-row table. */
function rejectOf(row: string, header = HEADER): { line: number; field: string; reason: string; original: string } {
  const result = read(header + row + '\n');
  expect(result.table.count).toBe(0);
  expect(result.rejects).toHaveLength(1);
  return result.rejects[0];
}

describe('accepted rows', () => {
  it('stores every field in its column, in file order, with the line each row starts on', () => {
    const { table, rejects, rowsRead } = read(
      HEADER + 'Alpha beta,100.5,94,12.5,-40.25,,,,C1,\n"Gamma\ndelta",1e2,.5,,,45,-120,701,,\n',
    );
    expect(rejects).toEqual([]);
    expect(rowsRead).toBe(2);
    expect(table.count).toBe(2);
    expect([...table.line]).toEqual([2, 3]);
    expect(table.taxon.values).toEqual(['Alpha beta', 'Gamma\ndelta']);
    expect([...table.oldestMa]).toEqual([100.5, 100]);
    expect([...table.youngestMa]).toEqual([94, 0.5]);
    expect([...table.palaeoLat]).toEqual([12.5, NaN]);
    expect([...table.palaeoLon]).toEqual([-40.25, NaN]);
    expect([...table.lat]).toEqual([NaN, 45]);
    expect([...table.lon]).toEqual([NaN, -120]);
    expect([...table.plateId]).toEqual([NO_PLATE, 701]);
    expect([...table.collection.codes]).toEqual([0, ABSENT_CODE]);
    expect(table.collection.values).toEqual(['C1']);
    expect(table.reference).toBeUndefined();
  });

  it('accepts a present-day pair without a plate id and leaves the placing to the analysis', () => {
    const { table } = read('taxon,oldest_ma,youngest_ma,lat,lon,plate_id\nAlpha,10,5,1,2,\n');
    expect(table.count).toBe(1);
    expect(table.plateId[0]).toBe(NO_PLATE);
  });

  it('removes only the whitespace around text values and keeps case and inner spaces', () => {
    const { table } = read('taxon,oldest_ma,youngest_ma,lat,lon,group\n  Alpha  beta \t,10,5,1,2, Clade X \nalpha beta,10,5,1,2,\n');
    expect(table.taxon.values).toEqual(['Alpha  beta', 'alpha beta']);
    expect(table.group?.values).toEqual(['Clade X']);
    expect([...(table.group?.codes ?? [])]).toEqual([0, ABSENT_CODE]);
  });

  it('takes ages from oldest_ma/youngest_ma when given and from the interval when both are blank', () => {
    const { table, rejects } = read(HEADER + 'A,130,125,1,2,,,,,Aptian\nB,,,1,2,,,,, Albian \n');
    expect(rejects).toEqual([]);
    expect([...table.oldestMa]).toEqual([130, 113.0]);
    expect([...table.youngestMa]).toEqual([125, 100.5]);
  });

  it('passes blank lines over and counts them apart from the rows', () => {
    const result = read(HEADER + '\nA,10,5,1,2,,,,,\n\n');
    expect(result.rowsRead).toBe(1);
    expect(result.blankLines).toBe(2);
  });

  it('puts only values of accepted rows in the dictionaries', () => {
    const { table } = read(HEADER + 'Kept,10,5,1,2,,,,C1,\nDropped,10,5,95,2,,,,C2,\n');
    expect(table.taxon.values).toEqual(['Kept']);
    expect(table.collection.values).toEqual(['C1']);
  });

  it('uses an explicit mapping and reports which column fed each field', () => {
    const result = read('name;y;x;from;to\nA;1;2;10;5\n', { mapping: { taxon: 'name', palaeo_lat: 'y', palaeo_lon: 'x', oldest_ma: 'from', youngest_ma: 'to' } });
    expect(result.table.count).toBe(1);
    expect(result.delimiter).toBe(';');
    expect(result.columns.index.oldest_ma).toBe(3);
  });
});

describe('rejected rows', () => {
  it('gives a reason for every kind of bad value, naming the value and what was expected', () => {
    const cases: Array<[string, string, RegExp]> = [
      [' ,10,5,1,2,,,,,', 'taxon', /^taxon is blank; every row needs a taxon name$/],
      ['A,10,5,abc,2,,,,,', 'palaeo_lat', /^palaeo_lat "abc" is not a number; expected decimal degrees from -90 to 90$/],
      ['A,10,5,91,2,,,,,', 'palaeo_lat', /^palaeo_lat "91" is out of range; expected decimal degrees from -90 to 90$/],
      ['A,10,5,,,1,-180.5,,,', 'lon', /^lon "-180.5" is out of range; expected decimal degrees from -180 to 180$/],
      ['A,10,5,,,1,181,,,', 'lon', /from -180 to 180 \(longitudes from 0 to 360 must be converted first\)$/],
      ['A,5,10,1,2,,,,,', 'oldest_ma', /^oldest_ma "5" is less than youngest_ma "10"; oldest_ma is the older end/],
      ['A,10,-0.5,1,2,,,,,', 'youngest_ma', /^youngest_ma "-0.5" is negative; expected an age in Ma before present, 0 or more$/],
      // The Earth's age bound: 4567 Ma (Connelly et al. 2012, Science 338:651, from memory).
      ['A,5000,500,1,2,,,,,', 'oldest_ma', /^oldest_ma "5000" is older than the Earth; expected an age no older than the Earth \(4567 Ma\)$/],
      ['A,4567.5,4567.2,1,2,,,,,', 'oldest_ma', /^oldest_ma "4567.5" is older than the Earth/],
      ['A,6000,5000,1,2,,,,,', 'oldest_ma', /^oldest_ma "6000" is older than the Earth/],
      ['A,,,1,2,,,,,Cretaceous Park', 'interval', /^interval "Cretaceous Park" is not a known interval; expected a name from the built-in time chart$/],
      ['A,,,1,2,,,,,', 'interval', /^no age: oldest_ma, youngest_ma and interval are blank; expected oldest_ma and youngest_ma in Ma, or an interval name$/],
      ['A,10,,1,2,,,,,Aptian', 'youngest_ma', /^youngest_ma is blank but oldest_ma is "10"; give both, or leave both blank to use the interval$/],
      ['A,10,5,,,,,701,,', 'palaeo_lat', /^no position: palaeo_lat, palaeo_lon, lat and lon are all blank; expected palaeo_lat and palaeo_lon, or lat and lon$/],
      ['A,10,5,1,,,,,,', 'palaeo_lon', /^palaeo_lon is blank but palaeo_lat is "1"; give both palaeo_lat and palaeo_lon, or neither$/],
      ['A,10,5,"12,5",2,,,,,', 'palaeo_lat', /^palaeo_lat "12,5" uses a comma; a decimal point is expected/],
      ['A,10,5,1,2,,,-4,,', 'plate_id', /^plate_id "-4" is not a plate id; expected a whole number from 0 to 2147483647$/],
      ['A,10,5,Infinity,2,,,,,', 'palaeo_lat', /^palaeo_lat "Infinity" is not a finite number/],
      ['A,10,5,1,2', 'row', /^record has 5 fields but the header has 10; a value is missing/],
      ['A,10,5,1,2,,,,,,,', 'row', /^record has 12 fields but the header has 10; a value containing a comma must be enclosed in double quotes$/],
      ['"A"x,10,5,1,2,,,,,', 'row', /^malformed quoting: field 1 has text after its closing quote/],
    ];
    for (const [row, field, reason] of cases) {
      const reject = rejectOf(row);
      expect(reject.field, row).toBe(field);
      expect(reject.reason, row).toMatch(reason);
      expect(reject.original).toBe(row);
      expect(reject.line).toBe(2);
    }
  });

  it('keeps the original text and the starting line of a record that spans lines', () => {
    const { rejects } = read(`${HEADER}A,10,5,1,2,,,,,\r\n"B\r\nsecond line",10,5,95,2,,,,,\r\n`);
    expect(rejects).toEqual([
      { line: 3, field: 'palaeo_lat', reason: expect.stringMatching(/"95" is out of range/), original: '"B\r\nsecond line",10,5,95,2,,,,,' },
    ]);
  });

  it('counts every record as read, accepted or rejected', () => {
    const result = read(HEADER + 'A,10,5,1,2,,,,,\nB,1,2,1,2,,,,,\nC,10,5,1,2,,,,,\n');
    expect(result.rowsRead).toBe(3);
    expect(result.table.count + result.rejects.length).toBe(3);
  });
});

describe('tables that cannot be read', () => {
  it('refuses an empty text, a header without rows and a blank first line', () => {
    expect(() => read('')).toThrow(/^line 1, header "": expected a header line naming the columns, then data rows \(the file is empty\)$/);
    const noRows = /^line 2, row "": expected data rows after the header \(the file has a header but no data rows\)$/;
    expect(() => read(HEADER)).toThrow(noRows);
    expect(() => read(HEADER + '\n\n')).toThrow(noRows);
    expect(() => read('\n' + HEADER + 'A,10,5,1,2,,,,,\n')).toThrow(/^line 1, header "": expected the header naming the columns on the first line \(line 1 is blank\)$/);
  });

  it('fails on the header before reading any row', () => {
    const reader = createOccurrenceReader({ resolveInterval: resolveStub });
    expect(() => reader.push('name,age\nA,1\n')).toThrow(/no usable header/);
  });
});

describe('streaming', () => {
  it('reports progress after each chunk, ending with the number of rows read', () => {
    const seen: number[] = [];
    const result = read([HEADER, 'A,10,5,1,2,,,,,\nB,10,', '5,1,2,,,,,\n'], { onProgress: (n) => seen.push(n) });
    expect(seen).toEqual([0, 1, 2, 2]);
    expect(result.rowsRead).toBe(2);
  });

  it('gives the same table and rejects however the text is cut', () => {
    const rows = fc.constantFrom(
      'Alpha beta,100.5,94,12.5,-40.25,,,,C1,', '"Gamma, ""q""",10,5,,,1,2,701,C1,', ' Delta\t,,,1,2,,,,C2,Aptian',
      'Bad,1,2,1,2,,,,,', 'Worse,abc,2,1,2,,,,,', '"multi\r\nline",10,5,1,2,,,,,', 'short,1', '',
    );
    fc.assert(
      fc.property(fc.array(rows, { minLength: 1, maxLength: 12 }), fc.constantFrom('\n', '\r\n', '\r'), fc.array(fc.nat(400), { maxLength: 10 }), (list, eol, at) => {
        const text = [HEADER.trimEnd(), ...list, 'Last,1,0,0,0,,,,,'].join(eol);
        expect(read(cut(text, at))).toEqual(read(text));
      }),
      { numRuns: 300 },
    );
  });
});
