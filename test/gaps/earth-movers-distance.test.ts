import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { earthMoversDistanceSorted } from '../../src/gaps';

const emd = (a: number[], b: number[]) =>
  earthMoversDistanceSorted(Float64Array.from(a).sort(), Float64Array.from(b).sort());

describe("the earth mover's distance between two latitude samples", () => {
  it('is 5° for half the mass at 0° and half at 10° against all of it at 5° (worked by hand)', () => {
    // Each half moves 5°: cost ½·5 + ½·5 = 5. With the CDFs (Vallender 1974): |F₁ − F₂| is ½
    // on [0, 5) and ½ on [5, 10), so ∫|F₁ − F₂| = 2.5 + 2.5 = 5.
    expect(emd([0, 10], [5])).toBe(5);
  });

  it("matches the examples of SciPy's scipy.stats.wasserstein_distance documentation (cited from memory)", () => {
    // wasserstein_distance([0, 1, 3], [5, 6, 8]) = 5.0
    expect(emd([0, 1, 3], [5, 6, 8])).toBeCloseTo(5, 12);
    // wasserstein_distance([0, 1], [0, 1], [3, 1], [2, 2]) = 0.25: weights as repeated values.
    expect(emd([0, 0, 0, 1], [0, 0, 1, 1])).toBeCloseTo(0.25, 12);
  });

  it('is undefined when either sample is empty', () => {
    expect(emd([], [1])).toBeNaN();
    expect(emd([1], [])).toBeNaN();
  });

  it('is the shift when one sample is the other moved (Rubner et al. 2000: a translation costs its length)', () => {
    fc.assert(fc.property(
      fc.array(fc.integer({ min: -900, max: 900 }), { minLength: 1, maxLength: 40 }), fc.integer({ min: -300, max: 300 }),
      (tenths, shift) => {
        const a = tenths.map((t) => t / 10);
        expect(emd(a, a.map((x) => x + shift / 10))).toBeCloseTo(Math.abs(shift / 10), 9);
      },
    ));
  });

  it('is a metric on samples: zero for equal ones, symmetric, and within the triangle inequality', () => {
    const sample = fc.array(fc.integer({ min: -90, max: 90 }), { minLength: 1, maxLength: 30 });
    fc.assert(fc.property(sample, sample, sample, (a, b, c) => {
      expect(emd(a, a)).toBe(0);
      expect(emd(a, b)).toBeCloseTo(emd(b, a), 9);
      expect(emd(a, c)).toBeLessThanOrEqual(emd(a, b) + emd(b, c) + 1e-9);
    }));
  });
});
