import { describe, expect, it } from 'vitest';
import { InputError, MAX_LISTED_PROBLEMS } from '../../src/problems';
import { poleTableFromRecords } from '../../src/rotation';
import type { TableRecord } from '../../src/table';
import { TEST_POLE_HEADER } from './pole-rows';

// The pole table is our own format (DESIGN.md); the rules checked here are the documented ones.

const HEADER = TEST_POLE_HEADER;

function rows(...lines: string[]): TableRecord[] {
  return lines.map((l, i) => ({ line: i + 2, fields: l.split(',') }));
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

describe('reading a pole table', () => {
  it('gives the rows columnar in file order, with their lines', () => {
    const t = poleTableFromRecords(HEADER, rows('101,10,45,-30,5.5,0', '101,0,90,0,0,0', '201,20,-10,170,12,101'), 'poles.csv');
    expect(t.source).toBe('poles.csv');
    expect(t.count).toBe(3);
    expect(Array.from(t.line)).toEqual([2, 3, 4]);
    expect(Array.from(t.plateId)).toEqual([101, 101, 201]);
    expect(Array.from(t.ageMa)).toEqual([10, 0, 20]);
    expect(Array.from(t.poleLat)).toEqual([45, 90, -10]);
    expect(Array.from(t.poleLon)).toEqual([-30, 0, 170]);
    expect(Array.from(t.angleDeg)).toEqual([5.5, 0, 12]);
    expect(Array.from(t.relativeTo)).toEqual([0, 0, 101]);
    expect(t.notes).toEqual([]);
  });

  it('matches columns in any order and case and notes the columns it does not use', () => {
    const t = poleTableFromRecords([' Angle_Deg', 'RELATIVE_TO', 'comment', 'plate_id', 'age_ma', 'pole_lon', 'pole_lat'], rows('7.5,0,from a paper,301,30,20,-40'), 'p');
    expect([t.plateId[0], t.ageMa[0], t.poleLat[0], t.poleLon[0], t.angleDeg[0], t.relativeTo[0]]).toEqual([301, 30, -40, 20, 7.5, 0]);
    expect(t.notes).toEqual(['column "comment" is not used']);
  });

  it('keeps an identical repeat once and says so, also when the same rotation is written the other way round', () => {
    // (lat, lon, angle) and (−lat, lon ± 180, −angle) are the same rotation (antipodal pole, opposite sense).
    const t = poleTableFromRecords(HEADER, rows('101,10,45,-30,5,0', '101,10,45,-30,5,0', '101,10,-45,150,-5,0', ' ', '101,0,90,0,0,0'), 'p');
    expect(t.count).toBe(2);
    expect(t.notes).toEqual([
      'line 5 is blank; skipped',
      'line 3 repeats line 2 (plate 101 at 10 Ma relative to 0); used once',
      'line 4 repeats line 2 (plate 101 at 10 Ma relative to 0); used once',
    ]);
  });

  it('accepts one plate and age twice against two parents (a change of relative_to)', () => {
    const t = poleTableFromRecords(HEADER, rows('301,180,10,10,20,101', '301,180,12,8,21,0'), 'p');
    expect(t.count).toBe(2);
  });

  it.each([
    ['a plate id with decimals', ['101.5', '10', '45', '-30', '5', '0'], 'p line 2, plate_id "101.5": expected a plate id: a whole number from 0 to 2147483647'],
    ['a negative plate id', ['-3', '10', '45', '-30', '5', '0'], 'p line 2, plate_id "-3": expected a plate id: a whole number from 0 to 2147483647'],
    ['a non-numeric age', ['101', 'ten', '45', '-30', '5', '0'], 'p line 2, age_ma "ten": expected an age in Ma'],
    ['a negative age', ['101', '-1', '45', '-30', '5', '0'], 'p line 2, age_ma "-1": expected an age of 0 Ma or more'],
    ['a non-numeric latitude', ['101', '10', 'N45', '-30', '5', '0'], 'p line 2, pole_lat "N45": expected a latitude in degrees'],
    ['a latitude beyond the pole', ['101', '10', '90.5', '-30', '5', '0'], 'p line 2, pole_lat "90.5": expected a latitude from -90 to 90 degrees'],
    ['a decimal comma (a quoted field)', ['101', '10', '45', '-30,5', '5', '0'], 'p line 2, pole_lon "-30,5": expected a longitude in degrees'],
    ['a longitude beyond 180° (rejected, not normalised)', ['101', '10', '45', '190', '5', '0'], 'p line 2, pole_lon "190": expected a longitude from -180 to 180 degrees'],
    ['an angle that is not a finite number', ['101', '10', '45', '-30', 'Infinity', '0'], 'p line 2, angle_deg "Infinity": expected an angle in degrees'],
    ['an empty parent', ['101', '10', '45', '-30', '5', ''], 'p line 2, relative_to "": expected a plate id: a whole number from 0 to 2147483647'],
    ['a plate relative to itself', ['101', '10', '45', '-30', '5', '101'], 'p line 2, relative_to "101": expected a plate other than plate_id 101: a plate cannot move relative to itself'],
    ['a short row', ['101', '10', '45', '-30', '5'], 'p line 2, row "101,10,45,-30,5": expected 6 fields, as in the header'],
  ])('rejects %s, naming line, field, value and expectation', (_what, fields, message) => {
    expect(problemsOf(() => poleTableFromRecords(HEADER, [{ line: 2, fields }], 'p'))).toEqual([message]);
  });

  it('rejects two different rotations for one plate, age and parent, pointing at the first', () => {
    expect(problemsOf(() => poleTableFromRecords(HEADER, rows('101,10,45,-30,5,0', '101,10,45,-30,5.1,0'), 'p'))).toEqual([
      'p line 3, row "plate 101 at 10 Ma relative to 0": expected one rotation per plate, age and relative_to: line 2 gives a different one (pole 45, -30, angle 5)',
    ]);
  });

  it('rejects a third parent for one plate and age', () => {
    expect(problemsOf(() => poleTableFromRecords(HEADER, rows('301,180,10,10,20,101', '301,180,12,8,21,0', '301,180,1,1,1,201'), 'p'))).toEqual([
      'p line 4, relative_to "201": expected at most two rows for plate 301 at 180 Ma, one on each side of a change of relative_to; lines 2 and 3 already give it relative to 101 and 0',
    ]);
  });

  it('rejects a header without the required columns or with one twice', () => {
    expect(problemsOf(() => poleTableFromRecords(['plate_id', 'age', 'pole_lat', 'pole_lon', 'angle_deg', 'relative_to', 'Pole_Lat'], [], 'p'))).toEqual([
      'p line 1, header "Pole_Lat": expected the column pole_lat only once (column 3, "pole_lat", already gives it)',
      'p line 1, age_ma "": expected a column named age_ma in the header',
    ]);
  });

  it('rejects a table without rows', () => {
    expect(problemsOf(() => poleTableFromRecords(HEADER, rows(''), 'p'))).toEqual([
      'p line 2, row "": expected at least one pole row after the header',
    ]);
  });

  it('reports every problem of every row together', () => {
    expect(problemsOf(() => poleTableFromRecords(HEADER, rows('x,10,95,-30,5,0', '101,-2,45,-30,5,0'), 'p'))).toEqual([
      'p line 2, plate_id "x": expected a plate id: a whole number from 0 to 2147483647',
      'p line 2, pole_lat "95": expected a latitude from -90 to 90 degrees',
      'p line 3, age_ma "-2": expected an age of 0 Ma or more',
    ]);
  });

  it('lists at most MAX_LISTED_PROBLEMS problems and counts the rest', () => {
    const bad = Array.from({ length: MAX_LISTED_PROBLEMS + 7 }, () => '101,old,45,-30,5,0');
    try {
      poleTableFromRecords(HEADER, rows(...bad), 'p');
      expect.fail('expected a InputError');
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      expect(error.problems).toHaveLength(MAX_LISTED_PROBLEMS);
      expect(error.unlisted).toBe(7);
      expect(error.message.split('\n').at(-1)).toBe('… and 7 more problems in p');
    }
  });
});
