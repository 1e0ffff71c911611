import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { groupBySlice } from '../../src/footprint/group-by-slice';
import { DistinctCounter } from '../../src/footprint/distinct-counter';
import { ABSENT_CODE } from '../../src/table/occurrence-table';

describe('groupBySlice', () => {
  it('lists the rows of each slice in file order and leaves out rows of slice -1', () => {
    const groups = groupBySlice(Int32Array.from([2, 0, -1, 2, 1, 0]), 3);
    expect(Array.from(groups.start)).toEqual([0, 2, 3, 5]);
    expect(Array.from(groups.order)).toEqual([1, 5, 4, 0, 3]);
  });

  it('agrees with a filter per slice on random input (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1, max: 6 }), { maxLength: 200 }), (slices) => {
        const groups = groupBySlice(Int32Array.from(slices), 7);
        for (let s = 0; s < 7; s++) {
          const expected = slices.flatMap((v, i) => (v === s ? [i] : []));
          expect(Array.from(groups.order.subarray(groups.start[s], groups.start[s + 1]))).toEqual(expected);
        }
      }),
    );
  });
});

describe('DistinctCounter', () => {
  it('counts distinct codes per group, ignoring absent codes, with no carry-over between groups', () => {
    const codes = Uint32Array.from([3, 1, 3, ABSENT_CODE, 0, 1]);
    const order = Uint32Array.from([0, 1, 2, 3, 4, 5]);
    const counter = new DistinctCounter(4);
    expect(counter.count(codes, order, 0, 4)).toBe(2);
    expect(counter.count(codes, order, 2, 6)).toBe(3);
    expect(counter.count(codes, order, 3, 4)).toBe(0);
  });

  it('agrees with a Set on random groups (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 30 }), { minLength: 1, maxLength: 100 }), fc.nat(), fc.nat(), (values, a, b) => {
        const codes = Uint32Array.from(values);
        const order = Uint32Array.from(values.keys());
        const from = Math.min(a, b) % values.length;
        const to = from + (Math.max(a, b) % (values.length - from + 1));
        const counter = new DistinctCounter(31);
        expect(counter.count(codes, order, from, to)).toBe(new Set(values.slice(from, to)).size);
      }),
    );
  });
});
