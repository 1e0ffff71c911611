import type { OccurrenceTable } from './occurrence-table';

/**
 * How far past the other rows one row must reach before it is named: more than one bin width
 * plus this share of the next oldest row's age. A row a few bins older than the rest is ordinary
 * sampling; one that multiplies the time covered (5000 typed for 500) is a slip to look at.
 */
export const LONE_STRETCH_SHARE = 0.1;

/** The row that alone stretches equal bins far past every other row. */
export interface LoneOldestRow {
  /** Row index in the table. */
  readonly row: number;
  /** Line of the source file on which its record starts. */
  readonly line: number;
  /** Its oldest_ma, Ma: where the bins now reach. */
  readonly ageMa: number;
  /** The largest oldest_ma of every other row, Ma. */
  readonly nextAgeMa: number;
}

/**
 * The row whose oldest_ma is older than every other row's by more than `widthMa` +
 * LONE_STRETCH_SHARE × the next largest oldest_ma, or undefined when there is none (rows sharing the
 * oldest age are not one row alone; a table of fewer than two rows has nothing to compare).
 */
export function loneOldestRow(table: OccurrenceTable, widthMa: number): LoneOldestRow | undefined {
  let row = -1;
  let oldest = -Infinity;
  let next = -Infinity;
  for (let i = 0; i < table.count; i++) {
    const age = table.oldestMa[i];
    if (age > oldest) {
      next = oldest;
      oldest = age;
      row = i;
    } else if (age > next) {
      next = age;
    }
  }
  if (table.count < 2 || !(oldest - next > widthMa + LONE_STRETCH_SHARE * next)) return undefined;
  return { row, line: table.line[row], ageMa: oldest, nextAgeMa: next };
}
