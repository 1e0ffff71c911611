import type { RejectedRow } from '../table/occurrence-table';
import { csvLine } from './csv-text';

export const REJECTS_COLUMNS = ['line', 'field', 'reason', 'original'] as const;

/** `rejects.csv`: every row that was not used, by line, with the field at fault and the reason. */
export function rejectsCsv(rows: readonly RejectedRow[]): string {
  const sorted = [...rows].sort((a, b) => a.line - b.line);
  return [csvLine(REJECTS_COLUMNS), ...sorted.map((r) => csvLine([String(r.line), r.field, r.reason, r.original]))].join('');
}
