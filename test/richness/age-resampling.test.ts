import { describe, expect, it } from 'vitest';
import { ageResampledRichness } from '../../src/richness';

// Three slices 30–20, 20–10, 10–0 Ma, oldest first (slice i holds top < age ≤ base).
const scale = { baseMa: Float64Array.from([30, 20, 10]), topMa: Float64Array.from([20, 10, 0]) };

describe('age-uncertainty resampling', () => {
  it('reproduces raw richness exactly when every age is a point', () => {
    // By hand: slice 0 holds taxa 0 and 1 (ages 25, 22), slice 1 taxon 0 (15), slice 2 none.
    const rows = { taxon: Uint32Array.from([0, 1, 0, 0]), taxonCount: 2, oldestMa: Float64Array.from([25, 22, 15, 24]), youngestMa: Float64Array.from([25, 22, 15, 24]) };
    const r = ageResampledRichness(rows, scale, 20, 5);
    expect(Array.from(r.median)).toEqual([2, 1, 0]);
    expect(Array.from(r.lo)).toEqual([2, 1, 0]);
    expect(Array.from(r.hi)).toEqual([2, 1, 0]);
  });

  it('spreads a taxon over the slices its range spans, in proportion to the overlap', () => {
    // One row ranging 25–15 Ma: half its range in slice 0, half in slice 1. Over many draws the
    // taxon is counted in each with probability 1/2, so the 2.5 % and 97.5 % quantiles are 0 and 1.
    const rows = { taxon: Uint32Array.from([0]), taxonCount: 1, oldestMa: Float64Array.from([25]), youngestMa: Float64Array.from([15]) };
    const r = ageResampledRichness(rows, scale, 400, 9);
    expect([r.lo[0], r.hi[0], r.lo[1], r.hi[1], r.hi[2]]).toEqual([0, 1, 0, 1, 0]);
    expect(ageResampledRichness(rows, scale, 400, 9)).toEqual(r);
  });
});
