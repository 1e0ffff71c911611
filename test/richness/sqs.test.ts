import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  goodsU, occurrenceSingletons, shareholderQuorumSubsampling, sliceAbundances, sliceCollections, taxaPerSlice,
  type RichnessInput, type SqsSettings,
} from '../../src/richness';
import { arbitraryTable, tableOf } from './fixtures';

function sqsOf(input: RichnessInput, settings: SqsSettings) {
  const abundances = sliceAbundances(input);
  const f1 = occurrenceSingletons(abundances);
  const u = f1.map((f, s) => goodsU(f, input.start[s + 1] - input.start[s]));
  return { sqs: shareholderQuorumSubsampling(abundances, sliceCollections(input), u, settings), taxa: taxaPerSlice(abundances), u };
}

describe('shareholder quorum subsampling', () => {
  it('draws collections until the frequencies of the taxa drawn reach quorum / u (worked by hand)', () => {
    // Alroy 2010, Science 329: collection A holds taxa x, x, y; collection B holds z, z.
    // N = 5, f1 = 1 (y), u = 0.8; quorum 0.4 → the drawn taxa must cover 0.4/0.8 = 0.5 of the
    // occurrences (2.5 of 5). A first: x + y = 3/5 ≥ 0.5, stop with 2 taxa. B first: z = 2/5 < 0.5,
    // then A: 3 taxa. Each order has probability 1/2, so the expected richness is 2.5.
    const input = tableOf([[[0, 0, 0], [0, 0, 0], [1, 0, 0], [2, 1, 0], [2, 1, 0]]]);
    const trials = 4000;
    const { sqs } = sqsOf(input, { quorum: 0.4, trials, seed: 11 });
    expect(sqs.lo[0]).toBe(2);
    expect(sqs.hi[0]).toBe(3);
    // Binomial sd of the mean: 0.5/√4000 ≈ 0.008; five of them.
    expect(sqs.mean[0]).toBeCloseTo(2.5, 1);
    expect(Math.abs(sqs.mean[0] - 2.5)).toBeLessThan(0.04);
    expect(Math.abs(sqs.draws[0] - 1.5)).toBeLessThan(0.04);
  });

  it('gives NaN with a reason where coverage is below the quorum or the slice is empty', () => {
    // Three singletons and one doubleton: N = 5, f1 = 3, u = 0.4 < 0.5.
    const input = tableOf([[[0, 0, 0], [1, 1, 0], [2, 2, 0], [3, 3, 0], [3, 3, 0]], []]);
    const { sqs } = sqsOf(input, { quorum: 0.5, trials: 10, seed: 1 });
    expect(Array.from(sqs.reason)).toEqual([2, 1]);
    expect(sqs.mean[0]).toBeNaN();
    expect(sqs.lo[1]).toBeNaN();
  });

  it('recovers raw richness at full quorum on a slice without singletons', () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(9), fc.nat(7)), { minLength: 1, maxLength: 40 }), fc.nat(1000), (rows, seed) => {
      // Every row doubled: no singletons, u = 1; quorum 1 needs every occurrence's taxon.
      const input = tableOf([rows.flatMap(([t, c]) => [[t, c, 0], [t, c, 0]] as const)]);
      const { sqs, taxa } = sqsOf(input, { quorum: 1, trials: 20, seed });
      expect(sqs.mean[0]).toBe(taxa[0]);
      expect(sqs.lo[0]).toBe(taxa[0]);
    }));
  });

  it('approaches raw richness as the quorum nears full coverage on a fully sampled slice', () => {
    // 20 taxa, each in 25 collections of one occurrence: u = 1, every frequency 1/20.
    const rows: Array<[number, number, number]> = [];
    for (let t = 0; t < 20; t++) for (let k = 0; k < 25; k++) rows.push([t, t * 25 + k, 0]);
    const input = tableOf([rows]);
    const means = [0.5, 0.9, 0.99].map((quorum) => sqsOf(input, { quorum, trials: 200, seed: 3 }).sqs.mean[0]);
    expect(means[0]).toBeLessThan(means[1]);
    expect(means[1]).toBeLessThan(means[2]);
    expect(means[2]).toBe(20); // 0.99 of the occurrences needs all 20 equally common taxa
  });

  it('keeps lo ≤ hi ≤ raw taxa and min ≤ mean ≤ max, and repeats itself for the same seed', () => {
    fc.assert(fc.property(arbitraryTable, fc.double({ min: 0.05, max: 1, noNaN: true }), fc.nat(10_000), (input, quorum, seed) => {
      const settings = { quorum, trials: 25, seed };
      const { sqs, taxa } = sqsOf(input, settings);
      sqs.mean.forEach((m, s) => {
        if (sqs.reason[s] !== 0) return expect(m).toBeNaN();
        expect(sqs.lo[s]).toBeLessThanOrEqual(sqs.hi[s]);
        expect(sqs.hi[s]).toBeLessThanOrEqual(taxa[s]);
        expect(m).toBeGreaterThanOrEqual(1);
        expect(m).toBeLessThanOrEqual(taxa[s]);
      });
      expect(sqsOf(input, settings).sqs).toEqual(sqs);
    }));
  });

  it('keeps lo ≤ mean ≤ hi on the usual case of many trials over a many-collection slice', () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(30), fc.nat(40)), { minLength: 60, maxLength: 200 }), fc.nat(10_000), (rows, seed) => {
      const input = tableOf([rows.map(([t, c]) => [t, c, 0] as const)]);
      const { sqs } = sqsOf(input, { quorum: 0.3, trials: 200, seed });
      fc.pre(sqs.reason[0] === 0);
      expect(sqs.lo[0]).toBeLessThanOrEqual(sqs.mean[0]);
      expect(sqs.mean[0]).toBeLessThanOrEqual(sqs.hi[0]);
    }), { numRuns: 50 });
  });
});
