import { describe, expect, it } from 'vitest';
import { EXCLUSION_CODE, InputError } from '../../src/problems';
import type { TableRecord } from '../../src/table';
import { assignSlices, binsFromRecords } from '../../src/time';

// Bin tables are our own format (README); the rules checked here are the documented ones.

const HEADER = ['name', 'base_ma', 'top_ma'];

function rows(...fields: string[][]): TableRecord[] {
  return fields.map((f, i) => ({ line: i + 2, fields: f }));
}

function problemsOf(action: () => unknown): string[] {
  try {
    action();
  } catch (error) {
    if (error instanceof InputError) return error.message.split('\n');
    throw error;
  }
  throw new Error('expected a InputError');
}

describe('bins from a table', () => {
  it('sorts bins oldest first whatever the file order', () => {
    const scale = binsFromRecords(HEADER, rows(['young', '10', '0'], ['old', '30', '20'], ['mid', '20', '10']), 'my-bins.csv');
    expect(scale.label).toBe('my-bins.csv');
    expect(scale.names).toEqual(['old', 'mid', 'young']);
    expect(Array.from(scale.baseMa)).toEqual([30, 20, 10]);
    expect(Array.from(scale.topMa)).toEqual([20, 10, 0]);
  });

  it('matches columns in any order and case, with surrounding spaces', () => {
    const scale = binsFromRecords([' TOP_MA', 'Name ', 'base_ma'], rows(['5', ' upper ', ' 9.5 ']), 'bins');
    expect(scale.names).toEqual(['upper']);
    expect(scale.baseMa[0]).toBe(9.5);
  });

  it('allows gaps, and an age in a gap belongs to no slice', () => {
    const scale = binsFromRecords(HEADER, rows(['a', '30', '20'], ['b', '15', '5']), 'bins');
    const out = assignSlices(Float64Array.of(17), Float64Array.of(17), scale, { kind: 'mid-age' });
    expect(out.slice[0]).toBe(-1);
    expect(out.reason[0]).toBe(EXCLUSION_CODE.ageOutside);
  });

  it('names line, field, value and expectation for non-numeric and negative ages', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', 'ten', '0'], ['b', '5', '-1']), 'bins.csv'))).toEqual([
      'bins.csv line 2, base_ma "ten": expected a number in Ma',
      'bins.csv line 3, top_ma "-1": expected an age in Ma of 0 or more',
    ]);
  });

  it('refuses a bin older than the Earth (4567 Ma; Connelly et al. 2012, Science 338:651, from memory)', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', '5000', '4000'], ['b', '4000', '0']), 'bins'))).toEqual([
      'bins line 2, base_ma "5000": expected an age no older than the Earth (4567 Ma)',
    ]);
    expect(binsFromRecords(HEADER, rows(['a', '4567', '0']), 'bins').baseMa[0]).toBe(4567);
  });

  it('refuses a base that is not older than the top', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', '10', '10'], ['b', '5', '8']), 'bins.csv'))).toEqual([
      'bins.csv line 2, base_ma "10": expected an age older than top_ma (10 Ma)',
      'bins.csv line 3, base_ma "5": expected an age older than top_ma (8 Ma)',
    ]);
  });

  it('refuses duplicate names, pointing at the first use', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', '10', '0'], ['a', '20', '10']), 'bins.csv'))).toEqual([
      'bins.csv line 3, name "a": expected a name not already used (line 2 has it)',
    ]);
  });

  it('refuses overlapping bins, naming both bins and their lines', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', '30', '20'], ['b', '25', '10']), 'bins.csv'))).toEqual([
      'bins.csv line 3, base_ma "25": expected no overlap: bin "b" (line 3, 25–10 Ma) overlaps bin "a" (line 2, 30–20 Ma)',
    ]);
  });

  it('refuses a header without the required columns or with unknown ones', () => {
    expect(problemsOf(() => binsFromRecords(['name', 'base', 'top_ma'], [], 'bins.csv'))).toEqual([
      'bins.csv line 1, header "base": expected only the columns name, base_ma, top_ma',
      'bins.csv line 1, base_ma "": expected a column named base_ma in the header',
    ]);
    expect(problemsOf(() => binsFromRecords(['name', 'base_ma', 'top_ma', 'Name'], [], 'bins.csv'))).toEqual([
      'bins.csv line 1, header "Name": expected the column name only once (column 1, "name", already gives it)',
    ]);
  });

  it('refuses rows with the wrong number of fields, empty names and empty tables', () => {
    expect(problemsOf(() => binsFromRecords(HEADER, rows(['a', '10'], [' ', '10', '0']), 'bins.csv'))).toEqual([
      'bins.csv line 2, row "a,10": expected 3 fields, as in the header',
      'bins.csv line 3, name " ": expected a bin name',
    ]);
    expect(problemsOf(() => binsFromRecords(HEADER, [], 'bins.csv'))).toEqual(['bins.csv line 2, row "": expected at least one bin after the header']);
  });

  it('keeps every problem in the error for a user interface to list', () => {
    try {
      binsFromRecords(HEADER, rows(['a', 'x', 'y']), 'bins');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).problems).toEqual([
        { line: 2, field: 'base_ma', value: 'x', expected: 'a number in Ma' },
        { line: 2, field: 'top_ma', value: 'y', expected: 'a number in Ma' },
      ]);
    }
    expect.assertions(2);
  });
});
