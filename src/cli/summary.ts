import { EXCLUSION_REASONS, type AnalysisResult } from '../analysis';
import type { RejectedRow } from '../table/occurrence-table';

export interface RunSummary {
  readonly rowsRead: number;
  readonly accepted: number;
  readonly rejects: readonly RejectedRow[];
  readonly result: AnalysisResult;
  readonly written: readonly string[];
  readonly elapsedMs: number;
}

/** The few lines a user reads after a run: what went in, what was left out and why, where files went. */
export function printSummary(summary: RunSummary): void {
  const { result } = summary;
  const n = (value: number) => value.toLocaleString('en');
  const out: string[] = [];
  out.push(`rows read: ${n(summary.rowsRead)}; accepted: ${n(summary.accepted)}; rejected: ${n(summary.rejects.length)}`);
  for (const [field, count] of countBy(summary.rejects.map((r) => r.field))) out.push(`  rejected for ${field}: ${n(count)}`);
  for (const [reason, count] of countBy(Array.from(result.exclusions.reasons, (r) => EXCLUSION_REASONS[r]))) {
    out.push(`  not in any slice, ${reason}: ${n(count)}`);
  }
  const occupied = result.slices.filter((s) => s.occurrences > 0).length;
  out.push(`slices: ${result.slices.length} (${occupied} with occurrences); occupied cells over all slices: ${n(result.cells.count)}`);
  const noHull = result.slices.filter((s) => s.occurrences > 0 && s.hullNote !== undefined);
  if (noHull.length > 0) out.push(`  no convex hull for ${noHull.length} slice(s): ${noHull.map((s) => `${s.name} (${s.hullNote})`).join('; ')}`);
  if (result.collectionsArePositions) out.push('  the table names no collections: "collections" counts distinct positions');
  out.push(`wrote ${summary.written.join(', ')}`);
  out.push(`elapsed: ${(summary.elapsedMs / 1000).toFixed(2)} s`);
  process.stdout.write(out.join('\n') + '\n');
}

function countBy(keys: readonly string[]): Array<[string, number]> {
  const counts = new Map<string, number>();
  for (const key of keys) counts.set(key, (counts.get(key) ?? 0) + 1);
  return [...counts.entries()].sort((a, b) => b[1] - a[1]);
}
