import { createSeededRandom, type SeededRandom } from '../time/seeded-random';

/**
 * A generator for one slice of a seeded computation: the seed mixed with the slice index by a
 * multiply with the 32-bit golden-ratio constant, so each slice's draws depend only on the seed
 * and the slice, not on how many draws other slices took.
 */
export function sliceRandom(seed: number, slice: number): SeededRandom {
  return createSeededRandom((seed ^ Math.imul(slice + 1, 0x9e3779b9)) >>> 0);
}

/** A uniform integer 0 … bound − 1 (floor of a uniform in [0, 1) times bound; bias below 2^-32 · bound). */
export function uniformBelow(random: SeededRandom, bound: number): number {
  return Math.floor(random.nextUniform() * bound);
}
