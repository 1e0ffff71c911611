import type { OccurrenceTable } from './occurrence-table';

/** Largest oldest_ma of the accepted rows (0 for an empty table): where equal bins start. */
export function oldestAge(table: OccurrenceTable): number {
  let oldest = 0;
  for (let i = 0; i < table.count; i++) if (table.oldestMa[i] > oldest) oldest = table.oldestMa[i];
  return oldest;
}
