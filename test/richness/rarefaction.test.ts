import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rarefiedRichness } from '../../src/richness';

/** Mean distinct labels over every n-subset of the occurrences, by enumeration. */
function bruteForce(counts: number[], n: number): number {
  const labels = counts.flatMap((c, t) => Array.from({ length: c }, () => t));
  let subsets = 0;
  let sum = 0;
  const pick = (from: number, chosen: number[]) => {
    if (chosen.length === n) {
      subsets++;
      sum += new Set(chosen.map((i) => labels[i])).size;
      return;
    }
    for (let i = from; i <= labels.length - (n - chosen.length); i++) pick(i + 1, [...chosen, i]);
  };
  pick(0, []);
  return sum / subsets;
}

describe('Hurlbert rarefaction', () => {
  it('equals the mean over every subset of the sample, enumerated', () => {
    // Hurlbert 1971, Ecology 52, eq. 3, is the expectation over all C(N, n) equally likely subsets.
    const counts = [4, 2, 1, 1, 3];
    for (let n = 1; n <= 11; n++) {
      expect(rarefiedRichness(Uint32Array.from(counts), 0, counts.length, n)).toBeCloseTo(bruteForce(counts, n), 12);
    }
  });

  it('is 1 for a draw of one and NaN for a draw larger than the sample', () => {
    const counts = Uint32Array.from([3, 1]);
    expect(rarefiedRichness(counts, 0, 2, 1)).toBeCloseTo(1, 15);
    expect(rarefiedRichness(counts, 0, 2, 5)).toBeNaN();
  });

  it('to the full sample equals the raw count', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 1, max: 300 }), { minLength: 1, maxLength: 60 }), (list) => {
      const counts = Uint32Array.from(list);
      const total = list.reduce((a, b) => a + b, 0);
      expect(rarefiedRichness(counts, 0, counts.length, total)).toBeCloseTo(list.length, 9);
    }));
  });
});
