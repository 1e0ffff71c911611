/**
 * The rotation model's pole table (DESIGN.md): one total-reconstruction pole per plate and age,
 * `plate_id, relative_to, age_ma, pole_lat, pole_lon, angle_deg`. Each row rotates the plate's
 * present-day positions to where they were at `age_ma`, in the frame of the plate `relative_to`;
 * positive angles turn anticlockwise seen from above the pole (right-hand rule).
 */
import { ProblemList } from '../problems';
import {
  MAX_PLATE_ID, OTHER_COLUMNS, fieldCountProblem, isBlank, namedColumns, parseDecimal, parsePlateId, type TableRecord,
} from '../table';
import { quaternionFromPole } from './quaternion';

/** The columns of a pole table, read by name in any order (others are allowed and not used); listed and written in this order. */
export const POLE_TABLE_COLUMNS = ['plate_id', 'relative_to', 'age_ma', 'pole_lat', 'pole_lon', 'angle_deg'] as const;
type PoleColumn = (typeof POLE_TABLE_COLUMNS)[number];

/** Two rows for the same plate, age and parent agree when their unit quaternions differ by
 * less than this in every component (up to sign): only rounding apart, about 1e-10°. */
const SAME_ROTATION_TOLERANCE = 1e-12;

/** A validated pole table, columnar, in file order, each (plate, age, relative_to) once. */
export interface PoleTable {
  /** The file name or label used in messages. */
  readonly source: string;
  readonly count: number;
  /** Line of each row in the source (the header is line 1). */
  readonly line: Uint32Array;
  readonly plateId: Int32Array;
  /** Ma, 0 or more. */
  readonly ageMa: Float64Array;
  /** Degrees: latitude in [−90, 90], longitude in [−180, 180], angle anticlockwise about the pole. */
  readonly poleLat: Float64Array;
  readonly poleLon: Float64Array;
  readonly angleDeg: Float64Array;
  readonly relativeTo: Int32Array;
  /** What was accepted but should be told: unused columns, blank lines, repeated rows kept once. */
  readonly notes: readonly string[];
}

interface PoleRow {
  readonly line: number;
  readonly plateId: number;
  readonly ageMa: number;
  readonly poleLat: number;
  readonly poleLon: number;
  readonly angleDeg: number;
  readonly relativeTo: number;
}

const PLATE_ID_EXPECTED = `a plate id: a whole number from 0 to ${MAX_PLATE_ID}`;

/** Reads one field as a number in [min, max], or NaN after adding a problem. */
function numberField(
  line: number, field: PoleColumn, raw: string, what: string, min: number, max: number, range: string, problems: ProblemList,
): number {
  const v = parseDecimal(raw);
  if (Number.isNaN(v)) problems.add({ line, field, value: raw, expected: what });
  else if (v < min || v > max) problems.add({ line, field, value: raw, expected: range });
  else return v;
  return Number.NaN;
}

function plateField(line: number, field: PoleColumn, raw: string, problems: ProblemList): number {
  const id = parsePlateId(raw);
  if (id < 0) problems.add({ line, field, value: raw, expected: PLATE_ID_EXPECTED });
  return id;
}

function parseRow(record: TableRecord, width: number, c: Readonly<Record<PoleColumn, number>>, problems: ProblemList): PoleRow | undefined {
  const { line, fields } = record;
  const miscount = fieldCountProblem(record, width);
  if (miscount !== undefined) {
    problems.add(miscount);
    return undefined;
  }
  const before = problems.count;
  const plateId = plateField(line, 'plate_id', fields[c.plate_id], problems);
  const ageMa = numberField(line, 'age_ma', fields[c.age_ma], 'an age in Ma', 0, Infinity, 'an age of 0 Ma or more', problems);
  const poleLat = numberField(line, 'pole_lat', fields[c.pole_lat], 'a latitude in degrees', -90, 90, 'a latitude from -90 to 90 degrees', problems);
  const poleLon = numberField(line, 'pole_lon', fields[c.pole_lon], 'a longitude in degrees', -180, 180, 'a longitude from -180 to 180 degrees', problems);
  const angleDeg = numberField(line, 'angle_deg', fields[c.angle_deg], 'an angle in degrees', -Infinity, Infinity, 'an angle in degrees', problems);
  const relativeTo = plateField(line, 'relative_to', fields[c.relative_to], problems);
  if (plateId >= 0 && relativeTo === plateId) {
    problems.add({
      line, field: 'relative_to', value: fields[c.relative_to],
      expected: `a plate other than plate_id ${plateId}: a plate cannot move relative to itself`,
    });
  }
  return problems.count === before ? { line, plateId, ageMa, poleLat, poleLon, angleDeg, relativeTo } : undefined;
}

function sameRotation(a: PoleRow, b: PoleRow): boolean {
  const qa = quaternionFromPole(a.poleLat, a.poleLon, a.angleDeg), qb = quaternionFromPole(b.poleLat, b.poleLon, b.angleDeg);
  const sign = qa[0] * qb[0] + qa[1] * qb[1] + qa[2] * qb[2] + qa[3] * qb[3] < 0 ? -1 : 1;
  return qa.every((v, i) => Math.abs(v - sign * qb[i]) < SAME_ROTATION_TOLERANCE);
}

/**
 * Keeps each (plate, age, relative_to) once: a repeat of the same rotation is noted and kept once,
 * a different rotation is a problem. At most two parents per plate and age (a change of
 * relative_to is tabulated at one age against both plates).
 */
function distinctRows(rows: readonly PoleRow[], problems: ProblemList, notes: string[]): PoleRow[] {
  const seen = new Map<string, PoleRow>();
  const parents = new Map<string, PoleRow[]>();
  const kept: PoleRow[] = [];
  for (const row of rows) {
    const at = `plate ${row.plateId} at ${row.ageMa} Ma`;
    const first = seen.get(`${row.plateId}|${row.ageMa}|${row.relativeTo}`);
    if (first !== undefined) {
      if (sameRotation(first, row)) notes.push(`line ${row.line} repeats line ${first.line} (${at} relative to ${row.relativeTo}); used once`);
      else {
        problems.add({
          line: row.line, field: 'row', value: `${at} relative to ${row.relativeTo}`,
          expected: `one rotation per plate, age and relative_to: line ${first.line} gives a different one (pole ${first.poleLat}, ${first.poleLon}, angle ${first.angleDeg})`,
        });
      }
      continue;
    }
    seen.set(`${row.plateId}|${row.ageMa}|${row.relativeTo}`, row);
    const others = parents.get(`${row.plateId}|${row.ageMa}`) ?? [];
    if (others.length === 2) {
      problems.add({
        line: row.line, field: 'relative_to', value: String(row.relativeTo),
        expected: `at most two rows for ${at}, one on each side of a change of relative_to; lines ${others[0].line} and ${others[1].line} already give it relative to ${others[0].relativeTo} and ${others[1].relativeTo}`,
      });
      continue;
    }
    others.push(row);
    parents.set(`${row.plateId}|${row.ageMa}`, others);
    kept.push(row);
  }
  return kept;
}

/**
 * Validates the records of a pole table (as scanned by `createCsvScanner`; the header is line
 * 1) and returns it columnar. Columns are matched by name as namedColumns does; others are
 * noted and not used. Blank lines are noted and skipped. Throws InputError listing every
 * problem: missing or repeated columns, wrong field counts, plate ids that are not whole
 * numbers, non-numeric values, negative ages, pole latitudes outside [−90, 90] or longitudes
 * outside [−180, 180] (not normalised), a plate relative to itself, two different rotations
 * for one plate, age and relative_to (an identical repeat is noted and kept once), more than
 * two parents for one plate and age, and an empty table.
 */
export function poleTableFromRecords(header: readonly string[], records: readonly TableRecord[], source: string): PoleTable {
  const problems = new ProblemList();
  const columns = namedColumns(header, POLE_TABLE_COLUMNS, OTHER_COLUMNS.ignore);
  for (const problem of columns.problems) problems.add(problem);
  problems.throwIfAny(source);
  const c = columns.index;
  const notes = columns.unused.map((cell) => `column "${cell}" is not used`);
  const parsed: PoleRow[] = [];
  for (const record of records) {
    if (record.fields.every(isBlank)) {
      notes.push(`line ${record.line} is blank; skipped`);
      continue;
    }
    const row = parseRow(record, header.length, c, problems);
    if (row !== undefined) parsed.push(row);
  }
  if (parsed.length === 0 && problems.count === 0) {
    problems.add({ line: 2, field: 'row', value: '', expected: 'at least one pole row after the header' });
  }
  const rows = distinctRows(parsed, problems, notes);
  problems.throwIfAny(source);
  return {
    source,
    count: rows.length,
    line: Uint32Array.from(rows, (r) => r.line),
    plateId: Int32Array.from(rows, (r) => r.plateId),
    ageMa: Float64Array.from(rows, (r) => r.ageMa),
    poleLat: Float64Array.from(rows, (r) => r.poleLat),
    poleLon: Float64Array.from(rows, (r) => r.poleLon),
    angleDeg: Float64Array.from(rows, (r) => r.angleDeg),
    relativeTo: Int32Array.from(rows, (r) => r.relativeTo),
    notes,
  };
}
