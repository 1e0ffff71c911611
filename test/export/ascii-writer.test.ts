import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { AsciiWriter } from '../../src/export/ascii-writer';

describe('AsciiWriter', () => {
  it('writes whole numbers as String() does, growing from a small buffer (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.maxSafeNat(), { maxLength: 200 }), (values) => {
        const writer = new AsciiWriter(0);
        const comma = AsciiWriter.encode(',');
        values.forEach((v) => writer.unsigned(v).bytes(comma));
        expect(new TextDecoder().decode(writer.take())).toBe(values.map((v) => `${v},`).join(''));
      }),
    );
  });

  it('hands out chunks that join into the same text, each the taker\'s to keep (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.maxSafeNat(), fc.string({ maxLength: 80 }).map((t) => t.replace(/[^\x20-\x7e]/g, '?'))), { maxLength: 300 }), fc.integer({ min: 1, max: 64 }), (pieces, chunkBytes) => {
        const writer = new AsciiWriter(chunkBytes);
        const chunks: Uint8Array[] = [];
        for (const piece of pieces) {
          if (typeof piece === 'number') writer.unsigned(piece);
          else writer.bytes(AsciiWriter.encode(piece));
          if (writer.full) chunks.push(writer.take());
        }
        chunks.push(writer.take());
        // Every chunk but the last reached the chunk size, and later writing changed none of them.
        for (const chunk of chunks.slice(0, -1)) expect(chunk.length).toBeGreaterThanOrEqual(chunkBytes);
        expect(chunks.map((c) => new TextDecoder().decode(c)).join('')).toBe(pieces.map(String).join(''));
      }),
    );
  });

  it('refuses text that is not ASCII rather than writing it wrongly', () => {
    expect(() => AsciiWriter.encode('bands:2°')).toThrow(/non-ASCII character at 7/);
  });
});
