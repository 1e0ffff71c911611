import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { spanWithoutDeg } from '../../src/sphere';

/** Brute force: the span of every leave-one-out set, the smallest of them (NaN when none is left). */
function bruteForce(lat: number[]): number {
  if (lat.length < 2) return NaN;
  let best = Infinity;
  for (let i = 0; i < lat.length; i++) {
    const rest = lat.filter((_, k) => k !== i);
    best = Math.min(best, Math.max(...rest) - Math.min(...rest));
  }
  return best;
}

describe('latitude span without the place that narrows it most', () => {
  it('agrees with removing each place in turn, repeated latitudes included', () => {
    const latitude = fc.oneof(fc.integer({ min: -90, max: 90 }), fc.double({ min: -90, max: 90, noNaN: true }));
    fc.assert(
      fc.property(fc.array(latitude, { maxLength: 20 }), (lat) => {
        const found = spanWithoutDeg(Float64Array.from(lat));
        const expected = bruteForce(lat);
        expect(found === expected || (Number.isNaN(found) && Number.isNaN(expected))).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('gives spans worked by hand: one outlier removed (123° → 84°), a shared extreme kept', () => {
    expect(spanWithoutDeg(Float64Array.of(-40, -35, 44, 83))).toBe(84); // without 83°N: −40 … 44; without 40°S: 118
    expect(spanWithoutDeg(Float64Array.of(-40, -40, 44, 44))).toBe(84);
    expect(spanWithoutDeg(Float64Array.of(10, 20))).toBe(0);
    expect(spanWithoutDeg(Float64Array.of(10))).toBeNaN();
  });
});
