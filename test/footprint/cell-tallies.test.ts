import { describe, expect, it } from 'vitest';
import { tallyCells } from '../../src/footprint/cell-tallies';
import { DistinctCounter } from '../../src/footprint/distinct-counter';

describe('tallyCells', () => {
  it('tallies occurrences, distinct collections and taxa per occupied cell, by slice then cell', () => {
    // Worked by hand: slice 0 has rows 0–2 in cells 7, 2, 7; slice 1 has rows 3–4, both in cell 2.
    const rows = {
      start: Uint32Array.from([0, 3, 5]),
      cell: Uint32Array.from([7, 2, 7, 2, 2]),
      collection: Uint32Array.from([0, 1, 0, 2, 2]),
      taxon: Uint32Array.from([0, 0, 1, 1, 1]),
    };
    const t = tallyCells(rows, new DistinctCounter(3), new DistinctCounter(2));
    expect(t.count).toBe(3);
    expect(Array.from(t.slice)).toEqual([0, 0, 1]);
    expect(Array.from(t.cell)).toEqual([2, 7, 2]);
    expect(Array.from(t.occurrences)).toEqual([1, 2, 2]);
    expect(Array.from(t.collections)).toEqual([1, 1, 1]);
    expect(Array.from(t.taxa)).toEqual([1, 2, 1]);
  });

  it('handles cell numbers up to the largest HEALPix nside (12·8192² cells) and empty slices', () => {
    const top = 12 * 8192 * 8192 - 1;
    const rows = { start: Uint32Array.from([0, 0, 2]), cell: Uint32Array.from([top, 0]), collection: new Uint32Array(2), taxon: new Uint32Array(2) };
    const t = tallyCells(rows, new DistinctCounter(1), new DistinctCounter(1));
    expect(Array.from(t.cell)).toEqual([0, top]);
    expect(Array.from(t.slice)).toEqual([1, 1]);
  });
});
