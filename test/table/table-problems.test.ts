import { describe, expect, it } from 'vitest';
import { emptyTableError, excerpt, malformedQuotingProblem } from '../../src/table/index';

describe('problems of a whole table', () => {
  it('shows the start of a record on one line, marking a cut with …', () => {
    expect(excerpt('a,b\nc,d', 0)).toBe('a,b…');
    expect(excerpt('a,b', 0)).toBe('a,b');
    expect(excerpt('x'.repeat(50), 0)).toBe(`${'x'.repeat(40)}…`);
    expect(excerpt('head\n"open,1\r\nmore', 5)).toBe('"open,1…');
  });

  it('names line 1 and the header for an empty file', () => {
    expect(emptyTableError().problems).toEqual([{ line: 1, field: 'header', value: '', expected: 'a header line naming the columns (the file is empty)' }]);
    expect(emptyTableError().message).toBe('line 1, header "": expected a header line naming the columns (the file is empty)');
  });

  it('names the line, the record and the scanner\'s finding for broken quoting', () => {
    expect(malformedQuotingProblem(4, '"A"x,1', 'field 1 has text after its closing quote')).toEqual({
      line: 4, field: 'row', value: '"A"x,1', expected: 'well-formed quoting: field 1 has text after its closing quote',
    });
    expect(malformedQuotingProblem(1, '"a"b', 'field 1 has text after its closing quote').field).toBe('header');
  });
});
