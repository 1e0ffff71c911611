import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { StringDictionary } from '../../src/table/index';

describe('StringDictionary', () => {
  it('numbers distinct strings in first-seen order', () => {
    const d = new StringDictionary();
    expect(['b', 'a', 'b', 'c', 'a'].map((s) => d.code(s))).toEqual([0, 1, 0, 2, 1]);
    expect(d.values).toEqual(['b', 'a', 'c']);
  });

  it('codes a span of a longer text as the same text cut out', () => {
    const d = new StringDictionary();
    const text = 'xx,Alpha beta,yy,Alpha beta';
    expect(d.codeOf(text, 3, 13)).toBe(d.code('Alpha beta'));
    expect(d.codeOf(text, 17, 27)).toBe(0);
    expect(d.codeOf(text, 3, 8)).toBe(1);
    expect(d.values).toEqual(['Alpha beta', 'Alpha']);
  });

  it('agrees with a Map on many strings, through every growth of its table', () => {
    // The built-in Map as the reference for first-seen numbering.
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 6 }), { maxLength: 3000 }), (strings) => {
        const d = new StringDictionary();
        const reference = new Map<string, number>();
        for (const s of strings) {
          if (!reference.has(s)) reference.set(s, reference.size);
          expect(d.code(s)).toBe(reference.get(s));
        }
        expect(d.values).toEqual([...reference.keys()]);
      }),
      { numRuns: 30 },
    );
  });
});

describe('StringDictionary at scale', () => {
  it('keeps its codes through many growths of the table', () => {
    const d = new StringDictionary();
    const reference = new Map<string, number>();
    const codes: number[] = [];
    const expected: number[] = [];
    for (let i = 0; i < 60_000; i++) {
      const s = `taxon ${(i * 7919) % 20_011}`;
      if (!reference.has(s)) reference.set(s, reference.size);
      codes.push(d.code(s));
      expected.push(reference.get(s) ?? -1);
    }
    expect(codes).toEqual(expected);
    expect(d.values.length).toBe(20_011);
    expect(d.values).toEqual([...reference.keys()]);
  });
});
