/** A reproducible stream of pseudo-random numbers. */
export interface SeededRandom {
  /** Next output as an unsigned 32-bit integer. */
  nextUint32(): number;
  /** Next output as a uniform number in [0, 1): the 32-bit output divided by 2^32. */
  nextUniform(): number;
}

const WEYL_INCREMENT = 0x6d2b79f5;
const TWO_TO_32 = 4294967296;

/** True for the seeds createSeededRandom accepts: integers 0 … 2^32 − 1. */
export function isSeed(seed: number): boolean {
  return Number.isInteger(seed) && seed >= 0 && seed < TWO_TO_32;
}

/**
 * Mulberry32 (Ettinger, 2017): a 32-bit Weyl sequence (state += 0x6D2B79F5) scrambled by two
 * multiply–xorshift rounds. One 32-bit state word, period 2^32 — ample for one draw per row —
 * and identical on every JavaScript engine because it uses only Math.imul and 32-bit integer
 * operations. Not for cryptography. Throws RangeError unless the seed is an integer 0 … 2^32 − 1.
 */
export function createSeededRandom(seed: number): SeededRandom {
  if (!isSeed(seed)) throw new RangeError(`Seed ${seed} is not an integer from 0 to 4294967295.`);
  let state = seed | 0;
  const nextUint32 = (): number => {
    state = (state + WEYL_INCREMENT) | 0;
    let t = Math.imul(state ^ (state >>> 15), state | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return (t ^ (t >>> 14)) >>> 0;
  };
  return { nextUint32, nextUniform: () => nextUint32() / TWO_TO_32 };
}
