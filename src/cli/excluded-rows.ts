import { excludedLines, excludedRows, type Exclusions, type Placement, type RotateAt } from '../placement';
import type { RotationModel } from '../rotation';
import type { OccurrenceTable, RejectedRow } from '../table/occurrence-table';
import { readRawRecords } from './read-table-file';

/** The excluded rows of a table file as rejects, their original text read again from the file. */
export async function excludedRowsOfFile(
  input: string, table: OccurrenceTable, exclusions: Exclusions, placement: Placement, model: RotationModel | undefined, rotateAt: RotateAt,
): Promise<RejectedRow[]> {
  if (exclusions.rows.length === 0) return [];
  const originals = await readRawRecords(input, excludedLines(table, exclusions));
  return excludedRows(table, exclusions, placement, model, rotateAt, originals);
}
