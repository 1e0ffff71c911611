/**
 * The small named-column tables (bins, poles…): a header naming the columns, then records of
 * text fields. Columns are found by name in any order; names match ignoring case, surrounding
 * space and the separators `_`, space, `-` and `.` (normaliseHeader), so `Base MA` is `base_ma`.
 */
import type { InputProblem } from '../problems';
import { normaliseHeader } from './column-synonyms';

/** One record of a small table, its fields as text; the header is line 1. */
export interface TableRecord {
  readonly line: number;
  readonly fields: readonly string[];
}

/** What to do with a header cell that names none of the table's columns. */
export const OTHER_COLUMNS = {
  /** A problem: the table has exactly its own columns. */
  refuse: 'refuse',
  /** Listed in `unused` and not read. */
  ignore: 'ignore',
} as const;
export type OtherColumns = (typeof OTHER_COLUMNS)[keyof typeof OTHER_COLUMNS];

export interface NamedColumns<C extends string> {
  /** 0-based column of each name; -1 for a column the header lacks. */
  readonly index: Readonly<Record<C, number>>;
  /** Header cells naming none of the columns, as written (only with OTHER_COLUMNS.ignore). */
  readonly unused: readonly string[];
  /** Missing, repeated and (with OTHER_COLUMNS.refuse) unknown columns, all on line 1. */
  readonly problems: readonly InputProblem[];
}

/** Finds each of `columns` in `header` by name; every missing or repeated column is a problem. */
export function namedColumns<C extends string>(header: readonly string[], columns: readonly C[], others: OtherColumns): NamedColumns<C> {
  const byName = new Map(columns.map((c) => [normaliseHeader(c), c]));
  const index = Object.fromEntries(columns.map((c) => [c, -1])) as Record<C, number>;
  const unused: string[] = [];
  const problems: InputProblem[] = [];
  header.forEach((cell, i) => {
    const column = byName.get(normaliseHeader(cell));
    if (column === undefined) {
      if (others === OTHER_COLUMNS.ignore) unused.push(cell);
      else problems.push({ line: 1, field: 'header', value: cell, expected: `only the columns ${columns.join(', ')}` });
    } else if (index[column] >= 0) {
      problems.push({
        line: 1, field: 'header', value: cell,
        expected: `the column ${column} only once (column ${index[column] + 1}, "${header[index[column]]}", already gives it)`,
      });
    } else {
      index[column] = i;
    }
  });
  for (const column of columns) {
    if (index[column] < 0) problems.push({ line: 1, field: column, value: '', expected: `a column named ${column} in the header` });
  }
  return { index, unused, problems };
}

/** The problem with a record whose field count differs from the header's, if it does. */
export function fieldCountProblem(record: TableRecord, width: number): InputProblem | undefined {
  if (record.fields.length === width) return undefined;
  return { line: record.line, field: 'row', value: record.fields.join(','), expected: `${width} fields, as in the header` };
}
