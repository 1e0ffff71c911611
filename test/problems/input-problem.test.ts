import { describe, expect, it } from 'vitest';
import { InputError, MAX_LISTED_PROBLEMS, ProblemList, describeProblem } from '../../src/problems';

describe('input problems', () => {
  it('names the source, line, field, value and what was expected', () => {
    expect(describeProblem({ line: 4, field: 'pole_lat', value: '95', expected: 'a latitude from -90 to 90 degrees' }, 'poles.csv'))
      .toBe('poles.csv line 4, pole_lat "95": expected a latitude from -90 to 90 degrees');
  });

  it('starts at the field when there is neither source nor line', () => {
    expect(describeProblem({ field: '--seed', value: '-1', expected: 'a whole number from 0 to 4294967295' }))
      .toBe('--seed "-1": expected a whole number from 0 to 4294967295');
  });

  it('keeps the first problems of a long list and counts the rest', () => {
    const list = new ProblemList();
    for (let k = 0; k < MAX_LISTED_PROBLEMS + 3; k++) list.add({ line: k + 2, field: 'age_ma', value: 'x', expected: 'a number' });
    expect(list.count).toBe(MAX_LISTED_PROBLEMS + 3);
    expect(() => list.throwIfAny('poles.csv')).toThrow(InputError);
    try {
      list.throwIfAny('poles.csv');
    } catch (error) {
      const lines = (error as InputError).message.split('\n');
      expect(lines).toHaveLength(MAX_LISTED_PROBLEMS + 1);
      expect(lines.at(-1)).toBe('… and 3 more problems in poles.csv');
    }
  });

  it('throws nothing when nothing was found', () => {
    expect(() => new ProblemList().throwIfAny('bins.csv')).not.toThrow();
  });
});
