import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { continuationPrefix, findInvalidUtf8, sniffBytes } from '../../src/table/index';

const bytes = (...b: number[]): Uint8Array => Uint8Array.from(b);
const ascii = (s: string): Uint8Array => new TextEncoder().encode(s);

/** Encodes ASCII text as UTF-16 without a byte-order mark. */
function utf16(s: string, littleEndian: boolean): Uint8Array {
  const out = new Uint8Array(2 * s.length);
  for (let i = 0; i < s.length; i++) out.set(littleEndian ? [s.charCodeAt(i), 0] : [0, s.charCodeAt(i)], 2 * i);
  return out;
}

describe('sniffBytes', () => {
  it('lets UTF-8 text through, with or without a byte-order mark', () => {
    expect(sniffBytes(ascii('taxon,lat\nÅland,1\n'))).toBeUndefined();
    expect(sniffBytes(bytes(0xef, 0xbb, 0xbf, 0x61))).toBeUndefined();
    expect(sniffBytes(new Uint8Array(0))).toBeUndefined();
  });

  it('recognises UTF-16 by its byte-order mark, either way round', () => {
    const utf16Problem = { field: 'encoding', value: 'UTF-16 text', expected: 'UTF-8 text; save the file as UTF-8' };
    expect(sniffBytes(bytes(0xff, 0xfe, 0x61, 0))).toEqual(utf16Problem);
    expect(sniffBytes(bytes(0xfe, 0xff, 0, 0x61))).toEqual(utf16Problem);
  });

  it('recognises UTF-16 without a byte-order mark by its NUL bytes on one side', () => {
    const text = 'taxon,oldest_ma,youngest_ma\nAlpha,1,0\n';
    expect(sniffBytes(utf16(text, true))?.value).toBe('UTF-16 text');
    expect(sniffBytes(utf16(text, false))?.value).toBe('UTF-16 text');
  });

  it('recognises UTF-32, ZIP archives and gzip', () => {
    expect(sniffBytes(bytes(0xff, 0xfe, 0, 0, 0x61, 0, 0, 0))).toEqual({ field: 'encoding', value: 'UTF-32 text', expected: 'UTF-8 text; save the file as UTF-8' });
    expect(sniffBytes(bytes(0x50, 0x4b, 3, 4, 20, 0))).toEqual({
      field: 'file', value: 'a ZIP archive (a spreadsheet workbook is one)', expected: 'a CSV or TSV text file; save the sheet as CSV or TSV',
    });
    expect(sniffBytes(bytes(0x1f, 0x8b, 8, 0))).toEqual({ field: 'file', value: 'gzip-compressed data', expected: 'a CSV or TSV text file; decompress it first' });
  });

  it('calls text with scattered NUL bytes binary and names the first offset', () => {
    const data = ascii('abcdefgh');
    data[5] = 0;
    expect(sniffBytes(data)).toEqual({ field: 'file', value: 'binary data (a NUL byte at offset 5)', expected: 'a CSV or TSV text file' });
  });
});

describe('findInvalidUtf8', () => {
  // Cases from the table of well-formed byte sequences, Unicode Standard §3.9, Table 3-7.
  it('accepts the boundaries of each row of Table 3-7', () => {
    for (const ok of [
      [0x7f], [0xc2, 0x80], [0xdf, 0xbf], [0xe0, 0xa0, 0x80], [0xed, 0x9f, 0xbf], [0xee, 0x80, 0x80],
      [0xf0, 0x90, 0x80, 0x80], [0xf4, 0x8f, 0xbf, 0xbf],
    ]) {
      expect(findInvalidUtf8(bytes(...ok))).toBe(-1);
    }
  });

  it('points at the first byte of overlong forms, surrogates and code points above U+10FFFF', () => {
    expect(findInvalidUtf8(bytes(0x61, 0xc0, 0x80))).toBe(1); // overlong NUL
    expect(findInvalidUtf8(bytes(0x61, 0x62, 0xe0, 0x80, 0x80))).toBe(2); // overlong
    expect(findInvalidUtf8(bytes(0xed, 0xa0, 0x80))).toBe(0); // U+D800, a surrogate
    expect(findInvalidUtf8(bytes(0xf4, 0x90, 0x80, 0x80))).toBe(0); // U+110000
    expect(findInvalidUtf8(bytes(0x61, 0x80))).toBe(1); // lone continuation byte
    expect(findInvalidUtf8(bytes(0x61, 0xe9, 0x6c))).toBe(1); // Latin-1 é inside ASCII
  });

  it('treats a sequence cut off at the end as ill-formed only at the end of the file', () => {
    expect(findInvalidUtf8(bytes(0x61, 0xe2, 0x82), false)).toBe(-1);
    expect(findInvalidUtf8(bytes(0x61, 0xe2, 0x82), true)).toBe(1);
  });

  it('agrees with a fatal TextDecoder on random bytes', () => {
    // TextDecoder (WHATWG Encoding Standard, implemented by the runtime) as the outside reference.
    const decoder = new TextDecoder('utf-8', { fatal: true });
    const high = fc.oneof(fc.integer({ min: 0, max: 255 }), fc.integer({ min: 0x80, max: 0xf5 }));
    fc.assert(
      fc.property(fc.array(high, { maxLength: 24 }), (list) => {
        const data = Uint8Array.from(list);
        let valid = true;
        try {
          decoder.decode(data);
        } catch {
          valid = false;
        }
        expect(findInvalidUtf8(data) === -1).toBe(valid);
      }),
      { numRuns: 2000 },
    );
  });

  it('finds the offset where a prefix stops decoding', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 20 }), fc.integer({ min: 0x80, max: 0xbf }), (s, bad) => {
        const good = new TextEncoder().encode(s);
        const data = new Uint8Array(good.length + 1);
        data.set(good);
        data[good.length] = bad; // a continuation byte with no lead byte
        expect(findInvalidUtf8(data)).toBe(good.length);
      }),
    );
  });
});

describe('continuationPrefix', () => {
  it('counts up to three leading continuation bytes', () => {
    expect(continuationPrefix(bytes(0x80, 0xbf, 0x61))).toBe(2);
    expect(continuationPrefix(bytes(0x80, 0x80, 0x80, 0x80))).toBe(3);
    expect(continuationPrefix(bytes(0xe2, 0x82))).toBe(0);
  });
});
