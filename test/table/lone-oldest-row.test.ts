import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LONE_STRETCH_SHARE, loneOldestRow } from '../../src/table/index';
import { tableOf as rowsTable } from '../placement/rows';

/** A table of rows with these oldest_ma (youngest_ma 0, one place), line k + 2 for row k. */
const tableOf = (oldestMa: number[]) => rowsTable(oldestMa.map((age) => ({ oldestMa: age, youngestMa: 0, palaeo: [0, 0] as const })));

describe('the row that alone stretches equal bins', () => {
  it('names the row 5000 Ma old among rows of at most 500 Ma, with its line and the next age', () => {
    expect(loneOldestRow(tableOf([480, 5000, 500, 12]), 10)).toEqual({ row: 1, line: 3, ageMa: 5000, nextAgeMa: 500 });
  });

  it('says nothing when the oldest row is within one bin plus a tenth of the next age (worked by hand)', () => {
    // 500 + 10 + 0.1 × 500 = 560: 560 is not beyond the rule, 560.5 is.
    expect(loneOldestRow(tableOf([500, 560]), 10)).toBeUndefined();
    expect(loneOldestRow(tableOf([500, 560.5]), 10)?.ageMa).toBe(560.5);
  });

  it('says nothing when two rows share the oldest age, or the table has fewer than two rows', () => {
    expect(loneOldestRow(tableOf([5000, 100, 5000]), 10)).toBeUndefined();
    expect(loneOldestRow(tableOf([5000]), 10)).toBeUndefined();
    expect(loneOldestRow(tableOf([]), 10)).toBeUndefined();
  });

  it('agrees with sorting the ages: named exactly when oldest − second oldest > width + share × second oldest', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 4567 }), { minLength: 2, maxLength: 30 }), fc.integer({ min: 1, max: 100 }), (ages, width) => {
        const sorted = [...ages].sort((a, b) => b - a);
        const expected = sorted[0] - sorted[1] > width + LONE_STRETCH_SHARE * sorted[1];
        const found = loneOldestRow(tableOf(ages), width);
        expect(found !== undefined).toBe(expected);
        if (found !== undefined) {
          expect(ages[found.row]).toBe(sorted[0]);
          expect(found.nextAgeMa).toBe(sorted[1]);
        }
      }),
    );
  });
});
