import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sharedCells, sliceAbundances, sliceCells } from '../../src/richness';
import { arbitraryTable, tableOf } from './fixtures';

describe('shared-footprint richness', () => {
  it('counts the cells of both slices and the taxa inside them, by hand', () => {
    // Rows [taxon, collection, cell]. Slice 0 occupies cells 4, 9, 700000; slice 1 cells 9, 12,
    // 700000; slice 2 cell 5. Shared 0–1: cells 9 and 700000. Slice 0's taxa there: 1 (cell 9),
    // 2 and 3 (cell 700000) → 3. Slice 1's taxa there: 1 (cell 9), 1 again (700000) → 1.
    // Shared 1–2: none → 0 cells, 0 taxa each.
    const input = tableOf([
      [[0, 0, 4], [1, 1, 9], [2, 2, 700000], [3, 2, 700000], [1, 3, 9]],
      [[1, 4, 9], [4, 5, 12], [1, 6, 700000]],
      [[5, 7, 5]],
    ]);
    const shared = sharedCells(input.start, sliceAbundances(input), sliceCells(input));
    expect(Array.from(shared.sharedCells)).toEqual([Number.NaN, 2, 0]);
    expect(Array.from(shared.taxaSharedPrev)).toEqual([Number.NaN, 3, 0]);
    expect(Array.from(shared.taxaShared)).toEqual([Number.NaN, 1, 0]);
  });

  it('equals counts made with sets on any small table', () => {
    fc.assert(fc.property(arbitraryTable, (input) => {
      const shared = sharedCells(input.start, sliceAbundances(input), sliceCells(input));
      const rowsOf = (s: number) => Array.from({ length: input.start[s + 1] - input.start[s] }, (_, k) => input.start[s] + k);
      for (let s = 1; s + 1 < input.start.length; s++) {
        const before = new Set(rowsOf(s - 1).map((r) => input.cell[r]));
        const both = new Set(rowsOf(s).map((r) => input.cell[r]).filter((c) => before.has(c)));
        const taxaIn = (slice: number) => new Set(rowsOf(slice).filter((r) => both.has(input.cell[r])).map((r) => input.taxon[r])).size;
        expect(shared.sharedCells[s]).toBe(both.size);
        expect(shared.taxaSharedPrev[s]).toBe(taxaIn(s - 1));
        expect(shared.taxaShared[s]).toBe(taxaIn(s));
      }
    }));
  });
});
