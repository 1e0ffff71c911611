/**
 * Seeded random draws for the demo generator: uniform numbers from the project's seeded
 * generator (src/time/seeded-random, mulberry32) and the few distributions the scenario needs.
 * Every draw goes through one `Rng`, so the same seed always yields the same files.
 */
import { createSeededRandom } from '../../src/time';

/** Uniform numbers in [0, 1). */
export type Rng = () => number;

/** A separate stream per part of the scenario, so that changing one part leaves the others'
 * draws as they were. The constant is 2^32/φ, the usual Weyl-sequence increment. */
export function streamFor(seed: number, part: number): Rng {
  return createSeededRandom((seed + Math.imul(part, 0x9e3779b9)) >>> 0).nextUniform;
}

export function uniform(rng: Rng, min: number, max: number): number {
  return min + (max - min) * rng();
}

/** An integer in [0, n). */
export function randomIndex(rng: Rng, n: number): number {
  return Math.floor(rng() * n);
}

export function pick<T>(rng: Rng, items: readonly T[]): T {
  return items[randomIndex(rng, items.length)];
}

/** Standard normal deviate by the Box–Muller transform (Box & Muller 1958). */
export function gaussian(rng: Rng): number {
  const u = 1 - rng(); // (0, 1]: keeps log finite
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

/** Exponential deviate with the given mean, by inversion. */
export function exponential(rng: Rng, mean: number): number {
  return -mean * Math.log(1 - rng());
}

/** Poisson deviate by multiplying uniforms (Knuth, TAOCP vol. 2, §3.4.1); fine for small means. */
export function poisson(rng: Rng, mean: number): number {
  const limit = Math.exp(-mean);
  let k = 0;
  for (let p = rng(); p > limit; p *= rng()) k++;
  return k;
}

/** Index drawn with probability proportional to `weights[i]` (`total` is their sum). */
export function weightedIndex(rng: Rng, weights: ArrayLike<number>, total: number): number {
  let target = rng() * total;
  for (let i = 0; i < weights.length; i++) {
    target -= weights[i];
    if (target < 0) return i;
  }
  for (let i = weights.length - 1; i >= 0; i--) if (weights[i] > 0) return i; // rounding at the end
  throw new Error('weightedIndex: every weight is zero; expected at least one positive weight.');
}
