import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { richnessCurves } from '../../src/richness';
import { arbitraryTable, tableOf } from './fixtures';

const grid = { cellCentreInto: (cell: number, out: Float64Array) => ((out[0] = (cell % 3) * 5), (out[1] = Math.floor(cell / 3) * 5), out) };

describe('richnessCurves', () => {
  it('puts NaN, never 0, where a slice has nothing to measure', () => {
    const input = tableOf([[[0, 0, 0], [1, 1, 1]], [], [[0, 2, 0]]]);
    const c = richnessCurves(input, { quorum: 0.5, trials: 10, seed: 1, rarefy: 2 });
    expect(c.taxa[1]).toBe(0);
    expect(c.goodsU[1]).toBeNaN();
    expect(c.chao1[1]).toBeNaN();
    expect(c.rarefied?.[1]).toBeNaN();
    expect(c.rarefied?.[2]).toBeNaN(); // one occurrence is below a draw of two
    expect(c.sqs.mean[1]).toBeNaN();
    expect(c.sqs.reason[1]).toBe(1);
    expect(c.crossers.rangeThrough[1]).toBe(1); // taxon 0 ranges through the empty slice
  });

  it('holds the invariants of every estimator and repeats itself for the same seed', () => {
    fc.assert(fc.property(arbitraryTable, fc.nat(1000), (input, seed) => {
      const options = { quorum: 0.4, trials: 10, seed, rarefy: 3, regions: { grid, minCells: 2, minCollections: 1, trials: 2 } };
      const c = richnessCurves(input, options);
      c.taxa.forEach((taxa, s) => {
        expect(c.crossers.rangeThrough[s]).toBeGreaterThanOrEqual(taxa);
        if (c.occurrences[s] === 0) return;
        expect(c.goodsU[s]).toBeGreaterThanOrEqual(0);
        expect(c.goodsU[s]).toBeLessThanOrEqual(1);
        expect(c.chao1[s]).toBeGreaterThanOrEqual(taxa);
        if (c.sqs.reason[s] === 0) expect(c.sqs.hi[s]).toBeLessThanOrEqual(taxa);
      });
      expect(richnessCurves(input, options)).toEqual(c);
    }), { numRuns: 50 });
  });

  it('rejects options it cannot use, naming the option and value', () => {
    const input = tableOf([[[0, 0, 0]]]);
    expect(() => richnessCurves(input, { quorum: 1.5, trials: 10, seed: 1 })).toThrow('quorum 1.5 is not a number in (0, 1].');
    expect(() => richnessCurves(input, { quorum: 0.5, trials: 0, seed: 1 })).toThrow('trials 0 is not a positive integer.');
    expect(() => richnessCurves(input, { quorum: 0.5, trials: 5, seed: 1, coverageFrom: 'references' })).toThrow('reference column');
  });
});
