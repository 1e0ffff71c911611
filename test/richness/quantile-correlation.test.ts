import { describe, expect, it } from 'vitest';
import { firstDifferences, pearson, sortedQuantile, spearman } from '../../src/richness';

describe('quantiles and correlations', () => {
  it('quantiles follow Hyndman & Fan definition 7', () => {
    // R 4: quantile(c(3,1,4,1,5,9,2,6,5,3), c(0.025, 0.5, 0.975), type = 7) → 1.000 3.500 8.325.
    const sorted = Float64Array.from([3, 1, 4, 1, 5, 9, 2, 6, 5, 3]).sort();
    expect(sortedQuantile(sorted, 0, 10, 0.025)).toBeCloseTo(1, 12);
    expect(sortedQuantile(sorted, 0, 10, 0.5)).toBeCloseTo(3.5, 12);
    expect(sortedQuantile(sorted, 0, 10, 0.975)).toBeCloseTo(8.325, 12);
  });

  it("Pearson's r matches a textbook example and R's cor()", () => {
    // x = 1…5, y = 2,4,5,4,5: Sxy = 6, Sxx = 10, Syy = 6, r = 6/√60 (by hand);
    // R 4: cor(x, y) = 0.774596669241483.
    const x = Float64Array.from([1, 2, 3, 4, 5]);
    const y = Float64Array.from([2, 4, 5, 4, 5]);
    expect(pearson(x, y).r).toBeCloseTo(6 / Math.sqrt(60), 14);
    expect(pearson(x, y).r).toBeCloseTo(0.774596669241483, 14);
    expect(pearson(x, y).pairs).toBe(5);
  });

  it("Spearman's rho with ties matches R's cor(method = 'spearman')", () => {
    // R 4: cor(c(1,2,3,4,5), c(2,4,5,4,5), method = "spearman") = 0.737864787372622;
    // cor(c(10.2,3.1,-4,7,7,2.5,0), c(1,3,3,8,2,-1,0), method = "spearman") = 0.145454545454545.
    expect(spearman(Float64Array.from([1, 2, 3, 4, 5]), Float64Array.from([2, 4, 5, 4, 5])).r).toBeCloseTo(0.737864787372622, 13);
    const a = Float64Array.from([10.2, 3.1, -4, 7, 7, 2.5, 0]);
    const b = Float64Array.from([1, 3, 3, 8, 2, -1, 0]);
    expect(spearman(a, b).r).toBeCloseTo(0.145454545454545, 13);
    expect(pearson(a, b).r).toBeCloseTo(0.189707475254903, 13); // R 4: cor(a, b)
  });

  it('skips incomplete pairs and reports how many were used', () => {
    const dx = firstDifferences(Float64Array.from([1, 3, Number.NaN, 4, 8, 9]));
    const dy = firstDifferences(Float64Array.from([0, 1, 2, 3, 5, 4]));
    // Differences: x NaN,2,NaN,NaN,4,1 — y NaN,1,1,1,2,−1: pairs at s = 1, 4, 5.
    expect(pearson(dx, dy).pairs).toBe(3);
    expect(pearson(dx.subarray(0, 3), dy.subarray(0, 3)).r).toBeNaN();
  });
});
