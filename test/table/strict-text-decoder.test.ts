import { describe, expect, it } from 'vitest';
import { InvalidUtf8Error, LineCounter, StrictTextDecoder } from '../../src/table';

const bytes = (...values: number[]) => new Uint8Array(values);

describe('StrictTextDecoder', () => {
  it('decodes a character split across chunks (U+20AC is E2 82 AC, Unicode Standard Table 3-7)', () => {
    const decoder = new StrictTextDecoder();
    expect(decoder.decode(bytes(0x61, 0xe2, 0x82)) + decoder.decode(bytes(0xac)) + decoder.end()).toBe('a€');
    expect(decoder.bytesRead).toBe(4);
  });

  it('names the byte where a bad sequence begins, even when it began in the previous chunk', () => {
    const decoder = new StrictTextDecoder();
    decoder.decode(bytes(0x61, 0x62, 0xe2, 0x82));
    expect(() => decoder.decode(bytes(0x41))).toThrow(expect.objectContaining({ byte: 2 }));
  });

  it('refuses a sequence cut off by the end of the input', () => {
    const decoder = new StrictTextDecoder();
    decoder.decode(bytes(0x61, 0xe2));
    expect(() => decoder.end()).toThrow(InvalidUtf8Error);
  });
});

describe('LineCounter', () => {
  it('counts LF, CRLF and lone CR as one break each, a CRLF split over two pushes included', () => {
    const lines = new LineCounter();
    lines.push(bytes(0x61, 0x0a, 0x62, 0x0d));
    lines.push(bytes(0x0a, 0x63, 0x0d, 0x64));
    expect(lines.line).toBe(4);
  });
});
