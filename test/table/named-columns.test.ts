import { describe, expect, it } from 'vitest';
import { OTHER_COLUMNS, fieldCountProblem, namedColumns } from '../../src/table/index';

// Small named-column tables are our own formats (README: bins, poles); the rules checked here
// are the documented ones.

const COLUMNS = ['name', 'base_ma', 'top_ma'] as const;

describe('namedColumns', () => {
  it('finds each column by name in any order', () => {
    const found = namedColumns(['top_ma', 'name', 'base_ma'], COLUMNS, OTHER_COLUMNS.refuse);
    expect(found.index).toEqual({ name: 1, base_ma: 2, top_ma: 0 });
    expect(found.problems).toEqual([]);
    expect(found.unused).toEqual([]);
  });

  it('ignores case, surrounding space and the separators _ - . and space', () => {
    const found = namedColumns([' NAME', 'Base MA', 'top-ma '], COLUMNS, OTHER_COLUMNS.refuse);
    expect(found.index).toEqual({ name: 0, base_ma: 1, top_ma: 2 });
    expect(namedColumns(['Name', 'BASE.MA', 'TopMa'], COLUMNS, OTHER_COLUMNS.refuse).problems).toEqual([]);
  });

  it('names each missing column on line 1', () => {
    expect(namedColumns(['name'], COLUMNS, OTHER_COLUMNS.refuse).problems).toEqual([
      { line: 1, field: 'base_ma', value: '', expected: 'a column named base_ma in the header' },
      { line: 1, field: 'top_ma', value: '', expected: 'a column named top_ma in the header' },
    ]);
  });

  it('refuses a column given twice, pointing at the first, even when written differently', () => {
    const found = namedColumns(['name', 'base_ma', 'top_ma', 'Base MA'], COLUMNS, OTHER_COLUMNS.refuse);
    expect(found.problems).toEqual([
      { line: 1, field: 'header', value: 'Base MA', expected: 'the column base_ma only once (column 2, "base_ma", already gives it)' },
    ]);
    expect(found.index.base_ma).toBe(1);
  });

  it('refuses other columns, or lists them as unused, as the table asks', () => {
    const header = ['name', 'comment', 'base_ma', 'top_ma'];
    expect(namedColumns(header, COLUMNS, OTHER_COLUMNS.refuse).problems).toEqual([
      { line: 1, field: 'header', value: 'comment', expected: 'only the columns name, base_ma, top_ma' },
    ]);
    const ignored = namedColumns(header, COLUMNS, OTHER_COLUMNS.ignore);
    expect(ignored.problems).toEqual([]);
    expect(ignored.unused).toEqual(['comment']);
    expect(ignored.index).toEqual({ name: 0, base_ma: 2, top_ma: 3 });
  });
});

describe('fieldCountProblem', () => {
  it('names the line and the record when its field count differs from the header', () => {
    expect(fieldCountProblem({ line: 7, fields: ['a', '10'] }, 3)).toEqual({ line: 7, field: 'row', value: 'a,10', expected: '3 fields, as in the header' });
    expect(fieldCountProblem({ line: 7, fields: ['a', '10', '0'] }, 3)).toBeUndefined();
  });
});
