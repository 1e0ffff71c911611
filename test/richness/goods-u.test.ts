import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { goodsU, occurrenceSingletons, referenceSingletons, sliceAbundances } from '../../src/richness';
import { arbitraryTable, tableOf } from './fixtures';

describe("Good's coverage", () => {
  it('is 1 − f1/N on a hand-counted abundance vector', () => {
    // Good 1953, Biometrika 40, 237–264: coverage estimate 1 − n1/N. Abundances 1,1,1,2,2,3,5:
    // N = 15 occurrences, f1 = 3 singletons, so u = 1 − 3/15 = 0.8 (by hand).
    const counts = [1, 1, 1, 2, 2, 3, 5];
    const input = tableOf([counts.flatMap((n, t) => Array.from({ length: n }, () => [t, 0, 0] as const))]);
    const f1 = occurrenceSingletons(sliceAbundances(input));
    expect(f1[0]).toBe(3);
    expect(goodsU(f1[0], 15)).toBeCloseTo(0.8, 15);
  });

  it('is NaN for an empty slice, not 0', () => {
    expect(goodsU(0, 0)).toBeNaN();
  });

  it('counts as singletons the taxa found in one reference only', () => {
    // Alroy 2010, Science 329: single-reference taxa as singletons. By hand: taxon 0 twice in
    // reference 5 (one reference), taxon 1 in references 5 and 6 (two), taxon 2 once (one),
    // taxon 3 twice with no reference named (each row its own reference: two).
    const input = tableOf([[[0, 0, 0], [0, 1, 0], [1, 0, 0], [1, 1, 0], [2, 0, 0], [3, 0, 0], [3, 1, 0]]]);
    const absent = 0xffffffff;
    const reference = Uint32Array.from([5, 5, 5, 6, 6, absent, absent]);
    expect(referenceSingletons(sliceAbundances(input), reference)[0]).toBe(2);
  });

  it('lies in [0, 1] on any table', () => {
    fc.assert(fc.property(arbitraryTable, (input) => {
      const f1 = occurrenceSingletons(sliceAbundances(input));
      for (let s = 0; s + 1 < input.start.length; s++) {
        const n = input.start[s + 1] - input.start[s];
        const u = goodsU(f1[s], n);
        if (n === 0) expect(u).toBeNaN();
        else expect(u >= 0 && u <= 1).toBe(true);
      }
    }));
  });
});
