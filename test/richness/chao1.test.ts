import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { chao1 } from '../../src/richness';

describe('bias-corrected Chao1', () => {
  it('matches the published formula worked by hand on a small abundance vector', () => {
    // Abundances 1,1,1,2,2,3,5: S_obs = 7, f1 = 3, f2 = 2, N = 15, k = 14/15. Bias-corrected
    // form with (N − 1)/N (Chao 2005; EstimateS user's guide — formula quoted from memory):
    // S = 7 + k·3·2/(2·3) = 7 + 14/15;
    // var = k·1 + k²·3·5²/(4·3²) + k²·3²·2·2²/(4·3⁴) = 14/15 + (196/225)(75/36 + 72/324).
    const k = 14 / 15;
    const variance = k + k * k * (75 / 36 + 72 / 324);
    const result = chao1(7, 3, 2, 15);
    expect(result.estimate).toBeCloseTo(7 + 14 / 15, 12);
    expect(result.sd).toBeCloseTo(Math.sqrt(variance), 12);
    expect(result.sd).toBeCloseTo(1.71515, 4); // the same by calculator
  });

  it('stays finite without doubletons, as the bias-corrected form does', () => {
    // Abundances 1,1,1,4: f1 = 3, f2 = 0, N = 7: S = 4 + (6/7)·3·2/(2·1) = 4 + 18/7 (by hand).
    expect(chao1(4, 3, 0, 7).estimate).toBeCloseTo(4 + 18 / 7, 12);
  });

  it('approaches the classic S + f1²/(2 f2) of Colwell & Coddington (1994) when f1 and f2 are large', () => {
    // f1(f1 − 1)/(2(f2 + 1)) → f1²/(2 f2) as both grow; k → 1 as N grows.
    const classic = 100 + 400000 ** 2 / (2 * 200000);
    expect(chao1(100, 400000, 200000, 1e12).estimate / classic).toBeCloseTo(1, 4);
  });

  it('is the observed count with no singletons, and NaN for an empty sample', () => {
    expect(chao1(5, 0, 3, 20)).toEqual({ estimate: 5, sd: 0 });
    expect(chao1(0, 0, 0, 0).estimate).toBeNaN();
  });

  it('is never below the observed count', () => {
    fc.assert(fc.property(fc.nat(50), fc.nat(50), fc.nat(50), fc.nat(200), (rest, f1, f2, extra) => {
      const observed = rest + f1 + f2;
      const n = f1 + 2 * f2 + rest * 3 + extra;
      fc.pre(n > 0);
      expect(chao1(observed, f1, f2, n).estimate).toBeGreaterThanOrEqual(observed);
    }));
  });
});
