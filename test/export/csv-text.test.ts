import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import Papa from 'papaparse';
import { csvLine, fixed, trimmed } from '../../src/export/csv-text';

describe('csvLine', () => {
  it('quotes only fields with a comma, quote or line break, doubling quotes (RFC 4180 §2.6–2.7)', () => {
    expect(csvLine(['a', 'b,c', 'say "hi"', 'two\nlines', ''])).toBe('a,"b,c","say ""hi""","two\nlines",\n');
  });

  it('is read back field for field by papaparse, an independent CSV reader (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.string({ unit: fc.constantFrom('a', ',', '"', '\n', '\r', ' ', 'é') }), { minLength: 2, maxLength: 6 }), (fields) => {
        const parsed = Papa.parse<string[]>(csvLine(fields), { newline: '\n' });
        expect(parsed.data[0]).toEqual(fields);
      }),
    );
  });
});

describe('fixed', () => {
  it('writes a fixed number of decimals, an empty field for NaN, and never "-0"', () => {
    expect(fixed(1.23456789, 3)).toBe('1.235');
    expect(fixed(NaN, 3)).toBe('');
    expect(fixed(-0.0000001, 3)).toBe('0.000');
    expect(fixed(-2.5, 1)).toBe('-2.5');
  });
});

describe('trimmed', () => {
  it('drops trailing zeros and a bare decimal point, keeping whole numbers whole', () => {
    expect(trimmed(538.8, 6)).toBe('538.8');
    expect(trimmed(66, 6)).toBe('66');
    expect(trimmed(100, 0)).toBe('100');
    expect(trimmed(0.0000004, 6)).toBe('0');
    expect(trimmed(251.902, 6)).toBe('251.902');
  });
});
