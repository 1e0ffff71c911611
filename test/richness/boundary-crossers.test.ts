import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boundaryCrossers, sliceAbundances, taxaPerSlice, threeTimers } from '../../src/richness';
import { arbitraryTable, tableOf } from './fixtures';

// Presence by slice (oldest first), by hand:
//   taxon 0: slice 0 only            → N_FL in 0
//   taxon 1: slices 0 and 2          → N_Ft in 0, N_bt in 1, N_bL in 2
//   taxon 2: slices 1, 3             → N_Ft in 1, N_bt in 2, N_bL in 3
//   taxon 3: slices 0, 1, 2, 3       → N_Ft in 0, N_bt in 1, 2, N_bL in 3
//   taxon 4: slice 2 only            → N_FL in 2
const presence = [[0, 1, 3], [2, 3], [1, 3, 4], [2, 3]];
const input = tableOf(presence.map((taxa) => taxa.map((t) => [t, 0, 0] as const)));
const abundances = sliceAbundances(input);

describe("Foote's boundary-crosser classes", () => {
  it('sort each taxon by how its range meets each slice (Foote 2000, Paleobiology 26(S4), Table 1)', () => {
    const c = boundaryCrossers(abundances, input.taxonCount);
    expect(Array.from(c.singletons)).toEqual([1, 0, 1, 0]);
    expect(Array.from(c.topOnly)).toEqual([2, 1, 0, 0]);
    expect(Array.from(c.both)).toEqual([0, 2, 2, 0]);
    expect(Array.from(c.bottomOnly)).toEqual([0, 0, 1, 2]);
    expect(Array.from(c.rangeThrough)).toEqual([3, 3, 4, 2]);
  });

  it('count range-through taxa at least as many as sampled ones', () => {
    fc.assert(fc.property(arbitraryTable, (table) => {
      const a = sliceAbundances(table);
      const raw = taxaPerSlice(a);
      const c = boundaryCrossers(a, table.taxonCount);
      raw.forEach((n, s) => {
        expect(c.rangeThrough[s]).toBeGreaterThanOrEqual(n);
        expect(c.singletons[s] + c.bottomOnly[s] + c.topOnly[s] + c.both[s]).toBe(c.rangeThrough[s]);
      });
    }));
  });
});

describe("Alroy's three-timers", () => {
  it('count taxa sampled before, in and after a slice, and part-timers missing from it (Alroy 2008, PNAS 105 suppl. 1)', () => {
    // Slice 1: before {0,1,3}, after {1,3,4}; both {1,3}; taxon 3 is in slice 1, taxon 1 is not:
    // 3T = 1, PT = 1, completeness 1/2. Slice 2: before {2,3}, after {2,3}; both in slice 2's
    // {1,3,4}? taxon 3 yes, taxon 2 no: 3T = 1, PT = 1. First and last slices: NaN.
    const t = threeTimers(abundances, input.taxonCount);
    expect(Array.from(t.threeTimers)).toEqual([Number.NaN, 1, 1, Number.NaN]);
    expect(Array.from(t.partTimers)).toEqual([Number.NaN, 1, 1, Number.NaN]);
    expect(Array.from(t.completeness)).toEqual([Number.NaN, 0.5, 0.5, Number.NaN]);
  });

  it('has no completeness when no taxon spans the slice', () => {
    const gap = tableOf([[[0, 0, 0]], [[1, 0, 0]], [[2, 0, 0]]]);
    const t = threeTimers(sliceAbundances(gap), 3);
    expect(t.threeTimers[1]).toBe(0);
    expect(t.completeness[1]).toBeNaN();
  });
});
