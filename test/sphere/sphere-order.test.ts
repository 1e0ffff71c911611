import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sphereOrder } from '../../src/sphere/sphere-order';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';

const seeded = (seed: number) => {
  let s = seed >>> 0 || 1;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
};

/** Unit vectors of n positions drawn by `r` uniformly over the sphere (Archimedes: z uniform). */
function spread(n: number, r: () => number): Float64Array {
  const lat = Float64Array.from({ length: n }, () => Math.asin(2 * r() - 1) * (180 / Math.PI));
  const lon = Float64Array.from({ length: n }, () => 360 * r() - 180);
  return degreesToUnitVectors(lat, lon);
}

describe('sphere order', () => {
  it('reorders exactly the listed indices, repeated and clustered points included (property)', () => {
    fc.assert(fc.property(fc.integer(), fc.integer({ min: 0, max: 500 }), fc.constantFrom(1, 1e-9, 0), (seed, n, scale) => {
      const r = seeded(seed);
      // A cluster of the given size about a random place (scale 0: all points the same).
      const lat = Float64Array.from({ length: n }, () => 40 + scale * (r() - 0.5));
      const lon = Float64Array.from({ length: n }, () => -70 + scale * (r() - 0.5));
      const xyz = degreesToUnitVectors(lat, lon);
      const listed = Uint32Array.from({ length: n }, (_, i) => i).filter(() => r() < 0.8);
      const ordered = sphereOrder(xyz, listed.slice());
      expect(Array.from(ordered).sort((a, b) => a - b)).toEqual(Array.from(listed));
    }), { numRuns: 200, seed: 41 });
  });

  it('puts consecutive points much closer together than they lie in a random order', () => {
    // Reference: the mean chord between consecutive points of a random order of uniform points
    // is the mean chord of two random points on the unit sphere, 4/3 (a standard integral).
    const n = 4000;
    const xyz = spread(n, seeded(42));
    const ordered = sphereOrder(xyz, Uint32Array.from({ length: n }, (_, i) => i));
    let sum = 0;
    for (let k = 1; k < n; k++) {
      const i = ordered[k - 1], j = ordered[k];
      sum += Math.hypot(xyz[3 * i] - xyz[3 * j], xyz[3 * i + 1] - xyz[3 * j + 1], xyz[3 * i + 2] - xyz[3 * j + 2]);
    }
    expect(sum / (n - 1)).toBeLessThan((4 / 3) / 10);
  });
});
