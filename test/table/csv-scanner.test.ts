import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/problems';
import { detectDelimiter } from '../../src/table/index';
import { csvTable, cut, scan, writeCsv } from './helpers';

function caught(f: () => unknown): unknown {
  try {
    f();
  } catch (err) {
    return err;
  }
  return undefined;
}

const fieldsOf = (text: string | string[]): string[][] => scan(text).map((r) => r.fields);

// The examples below follow the numbered rules of RFC 4180 §2 ("Definition of the CSV Format"),
// with the RFC's own sample values (aaa, bbb, ccc / zzz, yyy, xxx).
describe('RFC 4180 §2 examples', () => {
  it('reads records separated by CRLF (rule 1)', () => {
    expect(fieldsOf('aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n')).toEqual([['aaa', 'bbb', 'ccc'], ['zzz', 'yyy', 'xxx']]);
  });

  it('reads a last record without a line break (rule 2)', () => {
    expect(fieldsOf('aaa,bbb,ccc\r\nzzz,yyy,xxx')).toEqual([['aaa', 'bbb', 'ccc'], ['zzz', 'yyy', 'xxx']]);
  });

  it('keeps spaces as part of a field (rule 4)', () => {
    expect(fieldsOf('aaa, bbb ,ccc')).toEqual([['aaa', ' bbb ', 'ccc']]);
  });

  it('reads fields enclosed in double quotes (rule 5)', () => {
    expect(fieldsOf('"aaa","bbb","ccc"\r\nzzz,yyy,xxx')).toEqual([['aaa', 'bbb', 'ccc'], ['zzz', 'yyy', 'xxx']]);
  });

  it('reads line breaks and commas inside quoted fields (rule 6)', () => {
    expect(fieldsOf('"aaa","b\r\nbb","ccc"\r\nzzz,yyy,xxx')).toEqual([['aaa', 'b\r\nbb', 'ccc'], ['zzz', 'yyy', 'xxx']]);
    expect(fieldsOf('"a,a",b')).toEqual([['a,a', 'b']]);
  });

  it('reads a doubled quote inside a quoted field as one quote (rule 7)', () => {
    expect(fieldsOf('"aaa","b""bb","ccc"')).toEqual([['aaa', 'b"bb', 'ccc']]);
  });

  it('reads empty fields, quoted or not', () => {
    expect(fieldsOf('a,,"",b\n,')).toEqual([['a', '', '', 'b'], ['', '']]);
  });
});

describe('line endings, lines and raw text', () => {
  it('accepts LF, CRLF and lone CR line endings in one text', () => {
    expect(fieldsOf('a,b\nc,d\r\ne,f\rg,h')).toEqual([['a', 'b'], ['c', 'd'], ['e', 'f'], ['g', 'h']]);
  });

  it('gives each record the line it starts on, counting line breaks inside quotes', () => {
    const records = scan('h1,h2\n"x\r\ny\rz",1\nnext,2\r\nlast,3');
    expect(records.map((r) => r.line)).toEqual([1, 2, 5, 6]);
  });

  it('keeps the raw record text without its line ending', () => {
    const records = scan('h1,h2\r\n"a ""q""",\r\n');
    expect(records[1].raw).toBe('"a ""q""",');
    expect(records[1].fields).toEqual(['a "q"', '']);
  });

  it('ignores the line ending at the end of the text but reports blank lines inside it', () => {
    expect(fieldsOf('a\n\nb\n')).toEqual([['a'], [''], ['b']]);
    expect(fieldsOf('')).toEqual([]);
  });

  it('strips a byte-order mark at the start and nowhere else', () => {
    expect(fieldsOf('\ufeffa,b\n\ufeffc,d')).toEqual([['a', 'b'], ['\ufeffc', 'd']]);
    expect(fieldsOf(['', '\ufeffa', ',b'])).toEqual([['a', 'b']]);
  });

  it('keeps a quote inside an unquoted field as written', () => {
    const [record] = scan('5" core,b');
    expect(record.fields).toEqual(['5" core', 'b']);
    expect(record.problem).toBeUndefined();
  });

  it('flags text after a closing quote as malformed instead of guessing silently', () => {
    const [, record] = scan('h1,h2\n"ab"c,d');
    expect(record.problem).toMatch(/field 1 has text after its closing quote/);
  });
});

describe('delimiter detection from the header line', () => {
  it('picks the delimiter that occurs most often outside quotes', () => {
    expect(detectDelimiter('a\tb\tc,d\n', 0, true)).toBe('\t');
    expect(detectDelimiter('"a,b,c";d;e\n', 0, true)).toBe(';');
    expect(detectDelimiter('a,b;c\n', 0, true)).toBe(',');
    expect(detectDelimiter('single\n', 0, true)).toBe(',');
  });

  it('waits for the end of the header line before deciding', () => {
    expect(detectDelimiter('a;b;c,', 0, false)).toBeUndefined();
    expect(fieldsOf(['a,b;', 'c;d\n1;2;3'])).toEqual([['a,b', 'c', 'd'], ['1', '2', '3']]);
  });

  it('splits tab- and semicolon-separated text', () => {
    expect(fieldsOf('a\tb\n1\t"2\t3"')).toEqual([['a', 'b'], ['1', '2\t3']]);
    expect(fieldsOf('a;b\n1,5;2')).toEqual([['a', 'b'], ['1,5', '2']]);
  });
});

describe('failures', () => {
  it('names the line where an unclosed quoted field starts', () => {
    expect(() => scan('a,b\nc,d\ne,"f\ng,h\n')).toThrow(/^line 3, row ""f…": expected a closing quote for the quoted field that starts on this line, which is never closed/);
    const error = caught(() => scan('a,b\n"c'));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems).toEqual([{
      line: 2, field: 'row', value: '"c',
      expected: 'a closing quote for the quoted field that starts on this line, which is never closed (unbalanced quote; a quote inside a quoted value is written as "")',
    }]);
  });

  it('refuses a record longer than the limit, even when it arrives in small pieces', () => {
    const long = 'x'.repeat(100);
    expect(() => scan(['a,b\n', long, long], { maxRecordChars: 150 })).toThrow(/^line 2, row "x{40}…": expected a record of at most 150 characters/);
    expect(() => scan(`a,b\n${long}\n`, { maxRecordChars: 50 })).toThrow(/^line 2, row "x{40}…": expected a record of at most 50 characters/);
  });

  it('says a quoted field may be unbalanced when it stays open past the limit', () => {
    expect(() => scan(['a,b\nc,"', 'y'.repeat(80), 'y'.repeat(80)], { maxRecordChars: 100 })).toThrow(
      /^line 2, row "c,"y{37}…": expected a closing quote \("\) within 100 characters: a quoted field starts on this line and is still open; check for an unbalanced quote$/,
    );
  });

  it('blames a long record, not a quote, once a quoted field left open at a chunk end has closed', () => {
    expect(() => scan(['a,b\nc,"d', '"\n', 'x'.repeat(80), 'x'.repeat(80)], { maxRecordChars: 100 })).toThrow(
      /^line 3, row "x{40}…": expected a record of at most 100 characters/,
    );
  });
});

describe('properties', () => {
  it('reads back what an RFC 4180 writer wrote, whatever the line endings', () => {
    fc.assert(
      fc.property(csvTable, ([rows, endings]) => {
        const text = writeCsv(rows, endings);
        expect(scan(text, { delimiter: ',' }).map((r) => r.fields)).toEqual(rows.map((row) => row.map(([v]) => v)));
      }),
    );
  });

  it('gives the same records for every way of cutting a text in two or three pieces', () => {
    const text = 'h1,h2\r\n"a\r\nb",""""\r\nc,d\re,"f"\n\r\ng,h\r\n';
    const whole = scan(text);
    for (let i = 0; i <= text.length; i++) {
      for (let j = i; j <= text.length; j++) expect(scan(cut(text, [i, j]))).toEqual(whole);
    }
  });

  it('gives the same records however the text is cut into chunks', () => {
    fc.assert(
      fc.property(csvTable, fc.array(fc.nat(200), { maxLength: 12 }), ([rows, endings], at) => {
        const text = writeCsv(rows, endings);
        expect(scan(cut(text, at), { delimiter: ',' })).toEqual(scan(text, { delimiter: ',' }));
      }),
      { numRuns: 500 },
    );
  });

  it('agrees with papaparse on random quoted CSV', () => {
    // papaparse (a general-purpose CSV library, not written here) as the outside reference.
    fc.assert(
      fc.property(csvTable, fc.constantFrom('\n', '\r\n'), ([rows], eol) => {
        const text = writeCsv(rows, rows.map(() => eol));
        const reference = Papa.parse<string[]>(text, { delimiter: ',', newline: eol, quoteChar: '"', header: false });
        expect(scan(text, { delimiter: ',' }).map((r) => r.fields)).toEqual(reference.data);
      }),
      { numRuns: 300 },
    );
  });
});
