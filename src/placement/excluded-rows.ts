import { exclusionName } from '../problems';
import type { RotationModel } from '../rotation';
import type { OccurrenceTable, RejectedRow } from '../table';
import { describeExclusion } from './describe-exclusion';
import type { Exclusions } from './exclusions';
import type { Placement, RotateAt } from './place-occurrences';

/**
 * Rows the analysis could not use, as rejects with their original text (`originals`: line →
 * record text, read again from the input by the caller); rows the rotation model could not
 * place get a reason naming their plate and age.
 */
export function excludedRows(
  table: OccurrenceTable, exclusions: Exclusions, placement: Placement, model: RotationModel | undefined, rotateAt: RotateAt,
  originals: ReadonlyMap<number, string>,
): RejectedRow[] {
  const { rows, reasons } = exclusions;
  return Array.from(rows, (row, k) => {
    const line = table.line[row];
    const { field, reason } = describeExclusion(exclusionName(reasons[k]), table.plateId[row], placement.ageMa[row], model, rotateAt);
    return { line, field, reason, original: originals.get(line) ?? '' };
  });
}

/** The input lines of the excluded rows (to read their original text). */
export function excludedLines(table: OccurrenceTable, exclusions: Exclusions): Set<number> {
  const lines = new Set<number>();
  for (const row of exclusions.rows) lines.add(table.line[row]);
  return lines;
}
