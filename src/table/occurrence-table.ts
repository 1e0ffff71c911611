import type { RowProblem } from '../problems';

/** Code stored where a row has no value for an optional dictionary column (collection…). */
export const ABSENT_CODE = 0xffffffff;

/** Plate id stored where a row has none. */
export const NO_PLATE = -1;

/** A string column stored as codes into a dictionary of distinct values (first-seen order). */
export interface CodedColumn {
  readonly codes: Uint32Array;
  readonly values: readonly string[];
}

/**
 * Accepted occurrences, one index per row, columnar. Ages in Ma, positions in decimal degrees.
 * Rows keep the order of the source file.
 */
export interface OccurrenceTable {
  readonly count: number;
  /** Line in the source file on which each row's record starts (the header is line 1). */
  readonly line: Uint32Array;
  readonly taxon: CodedColumn;
  /** ABSENT_CODE where the row names no collection. */
  readonly collection: CodedColumn;
  /** Older end of the age range, Ma (oldest_ma >= youngest_ma >= 0). */
  readonly oldestMa: Float64Array;
  /** Younger end of the age range, Ma. */
  readonly youngestMa: Float64Array;
  /** Palaeocoordinates given in the table; NaN where the row has none. */
  readonly palaeoLat: Float64Array;
  readonly palaeoLon: Float64Array;
  /** Present-day coordinates; NaN where the row has none. */
  readonly lat: Float64Array;
  readonly lon: Float64Array;
  /** NO_PLATE where the row has none. */
  readonly plateId: Int32Array;
  /** Optional descriptive columns, present when the table has them. */
  readonly reference?: CodedColumn;
  readonly environment?: CodedColumn;
  readonly group?: CodedColumn;
}

/** A row that was not accepted or was left out, with the reason a person can act on. */
export interface RejectedRow extends RowProblem {
  /** Line on which the record starts (header is line 1). */
  readonly line: number;
  /** The record as it stood in the file, without its line ending. */
  readonly original: string;
}
