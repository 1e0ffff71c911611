import { describe, expect, it } from 'vitest';
import { tallyCells } from '../../src/footprint/cell-tallies';
import { DistinctCounter } from '../../src/footprint/distinct-counter';
import { groupBySlice } from '../../src/footprint/group-by-slice';

describe('tallyCells', () => {
  it('tallies occurrences, distinct collections and taxa per occupied cell, by slice then cell', () => {
    // Worked by hand: slice 0 has rows 0,1,3 (cells 7,2,7); slice 1 has rows 2,4 (cell 2,2).
    const groups = groupBySlice(Int32Array.from([0, 0, 1, 0, 1]), 2);
    const cellOfRow = Uint32Array.from([7, 2, 2, 7, 2]);
    const collections = Uint32Array.from([0, 1, 2, 0, 2]);
    const taxa = Uint32Array.from([0, 0, 1, 1, 1]);
    const t = tallyCells(groups, cellOfRow, collections, taxa, new DistinctCounter(3), new DistinctCounter(2));
    expect(t.count).toBe(3);
    expect(Array.from(t.slice)).toEqual([0, 0, 1]);
    expect(Array.from(t.cell)).toEqual([2, 7, 2]);
    expect(Array.from(t.occurrences)).toEqual([1, 2, 2]);
    expect(Array.from(t.collections)).toEqual([1, 1, 1]);
    expect(Array.from(t.taxa)).toEqual([1, 2, 1]);
  });

  it('handles cell numbers up to the largest HEALPix nside (12·8192² cells)', () => {
    const groups = groupBySlice(Int32Array.from([0, 0]), 1);
    const top = 12 * 8192 * 8192 - 1;
    const t = tallyCells(groups, Uint32Array.from([top, 0]), Uint32Array.from([0, 0]), Uint32Array.from([0, 0]), new DistinctCounter(1), new DistinctCounter(1));
    expect(Array.from(t.cell)).toEqual([0, top]);
  });
});
