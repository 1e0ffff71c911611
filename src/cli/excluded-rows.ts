import { describePlacementProblem, EXCLUSION_FIELDS, EXCLUSION_REASONS, exclusionStatus, type Exclusions, type Placement, type RotateAt } from '../placement';
import type { RotationModel } from '../rotation';
import type { OccurrenceTable, RejectedRow } from '../table/occurrence-table';
import { readRawRecords } from './read-table-file';

/**
 * Rows the analysis or reconstruct could not use, as rejects with their original text (read
 * again from the file); rows the rotation model could not place get a reason naming their
 * plate and age.
 */
export async function excludedRows(
  input: string, table: OccurrenceTable, exclusions: Exclusions, placement: Placement, model: RotationModel | undefined, rotateAt: RotateAt,
): Promise<RejectedRow[]> {
  const { rows, reasons } = exclusions;
  if (rows.length === 0) return [];
  const lines = new Set<number>();
  for (const row of rows) lines.add(table.line[row]);
  const originals = await readRawRecords(input, lines);
  return Array.from(rows, (row, k) => {
    const line = table.line[row];
    const status = exclusionStatus(reasons[k]);
    const { field, reason } = status === undefined
      ? { field: EXCLUSION_FIELDS[reasons[k]], reason: EXCLUSION_REASONS[reasons[k]] }
      : describePlacementProblem(status, table.plateId[row], placement.ageMa[row], model, rotateAt);
    return { line, field, reason, original: originals.get(line) ?? '' };
  });
}
