import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { AsciiWriter } from '../../src/export/ascii-writer';

describe('AsciiWriter', () => {
  it('writes whole numbers as String() does, growing from an empty buffer (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.maxSafeNat(), { maxLength: 200 }), (values) => {
        const writer = new AsciiWriter(0);
        const comma = AsciiWriter.encode(',');
        values.forEach((v) => writer.unsigned(v).bytes(comma));
        expect(new TextDecoder().decode(writer.result())).toBe(values.map((v) => `${v},`).join(''));
      }),
    );
  });

  it('refuses text that is not ASCII rather than writing it wrongly', () => {
    expect(() => AsciiWriter.encode('bands:2°')).toThrow(/non-ASCII character at 7/);
  });
});
