import type { AnalysisResult } from '../analysis';
import { SLICE_CAUTION, sliceCautions, type SliceCaution, type SliceNumbers } from '../footprint';
import { EXCLUSIONS, EXCLUSION_STAGE, exclusionName, type ExclusionStage } from '../problems';
import type { RotationModel } from '../rotation';
import type { LoneOldestRow } from '../table/lone-oldest-row';
import type { RejectedRow } from '../table/occurrence-table';
import { formatMa } from '../time';

export interface RunSummary {
  readonly rowsRead: number;
  readonly accepted: number;
  readonly rejects: readonly RejectedRow[];
  readonly result: AnalysisResult;
  readonly model: RotationModel | undefined;
  /** Under equal bins, the row that alone stretches them far back (see loneOldestRow). */
  readonly loneOldest?: LoneOldestRow;
  /** The fixed region's file, when only occurrences inside it are kept. */
  readonly within?: string;
  readonly written: readonly string[];
  readonly elapsedMs: number;
  /** Lines a command adds before the files written (the curves' quorum, flags and correlations). */
  readonly details?: readonly string[];
}

const n = (value: number) => value.toLocaleString('en');

/** The few lines a user reads after a run: what went in, what was left out and why, where files went. */
export function printSummary(summary: RunSummary): void {
  const { result } = summary;
  const out: string[] = [];
  out.push(`rows read: ${n(summary.rowsRead)}; accepted: ${n(summary.accepted)}; rejected: ${n(summary.rejects.length)}`);
  for (const [field, count] of countBy(summary.rejects.map((r) => r.field))) out.push(`  rejected for ${field}: ${n(count)}`);
  for (const [reason, count] of countBy(exclusionReasons(result, EXCLUSION_STAGE.slice))) {
    out.push(`  not in any slice, ${reason}: ${n(count)}`);
  }
  out.push(...placementLines(result, summary.model));
  if (summary.within !== undefined) out.push(`placed outside the fixed region ${summary.within}, left out of every slice: ${n(result.outsideRegion)}`);
  if (summary.loneOldest !== undefined) out.push(loneOldestLine(summary.loneOldest, result));
  const occupied = result.slices.filter((s) => s.occurrences > 0).length;
  out.push(`slices: ${result.slices.length} (${occupied} with occurrences); occupied cells over all slices: ${n(result.cells.count)}`);
  out.push(...cautionLines(result.slices));
  if (result.collectionsArePositions) out.push('  the table names no collections: "collections" counts distinct positions');
  out.push(...(summary.details ?? []));
  out.push(`wrote ${summary.written.join(', ')}`);
  out.push(`elapsed: ${(summary.elapsedMs / 1000).toFixed(2)} s`);
  process.stdout.write(out.join('\n') + '\n');
}

/** Rows placed from the table and by the model (clamped among them), and those that could not be. */
function placementLines(result: AnalysisResult, model: RotationModel | undefined): string[] {
  const { fromTable, fromModel, clamped } = result.placement;
  const byModel = model === undefined ? '' : `; by the rotation model ${model.source}: ${n(fromModel)}${clamped > 0 ? ` (${n(clamped)} clamped to the oldest age the model reaches for their plate)` : ''}`;
  const lines = [`placed from the table's palaeocoordinates: ${n(fromTable)}${byModel}`];
  for (const [reason, count] of countBy(exclusionReasons(result, EXCLUSION_STAGE.placement))) lines.push(`  not placed, ${reason}: ${n(count)}`);
  if (model !== undefined) lines.push(...modelNotes(model));
  return lines;
}

/**
 * The slices' cautions (README "Read the numbers with care"), one line per kind of caution with
 * the number of slices and a few of their names; each slice's numbers are in slices.csv.
 */
function cautionLines(slices: ReadonlyArray<SliceNumbers & { readonly name: string }>): string[] {
  const byKind = new Map<string, string[]>();
  for (const slice of slices) {
    for (const caution of sliceCautions(slice)) {
      const kind = cautionWording(caution);
      if (kind !== undefined) byKind.set(kind, [...(byKind.get(kind) ?? []), slice.name]);
    }
  }
  return [...byKind].map(([kind, names]) => {
    const shown = names.slice(0, LISTED_SLICES).join(', ') + (names.length > LISTED_SLICES ? ` and ${names.length - LISTED_SLICES} more` : '');
    return `  ${names.length} slice(s) ${kind}: ${shown}`;
  });
}

/** How the summary words a caution (empty slices are already counted on the slices line). */
function cautionWording(caution: SliceCaution): string | undefined {
  switch (caution.code) {
    case SLICE_CAUTION.noOccurrences: return undefined;
    case SLICE_CAUTION.fewPlaces: return `with fewer than ${caution.fewerThan} distinct places (every footprint measure is noisy)`;
    case SLICE_CAUTION.noHull: return `with no convex hull, ${caution.reason} (hull_km2 left empty)`;
    case SLICE_CAUTION.wideHull: return `with a hull over ${Math.round(100 * caution.above)}% of the sphere, close to a hemisphere (a few outlying places govern its area)`;
  }
}

/** The reason of each row the analysis left out at `stage`. */
function exclusionReasons(result: AnalysisResult, stage: ExclusionStage): string[] {
  return Array.from(result.exclusions.reasons, (code) => EXCLUSIONS[exclusionName(code)]).flatMap((e) => (e.stage === stage ? [e.reason] : []));
}

/** What the rotation model accepted but should be told (unused columns, repeated rows). */
export function modelNotes(model: RotationModel): string[] {
  return model.notes.map((note) => `  rotation model note: ${note}`);
}

/** Names the row that alone stretches equal bins back, with the age of every other row. */
function loneOldestLine(row: LoneOldestRow, result: AnalysisResult): string {
  const reach = result.slices.length > 0 ? formatMa(result.slices[0].baseMa) : formatMa(row.ageMa);
  return (
    `  note: line ${row.line} alone stretches the equal bins back to ${reach} Ma: its oldest_ma is ${formatMa(row.ageMa)} Ma, ` +
    `every other row's is ${formatMa(row.nextAgeMa)} Ma or younger (check that row's age)`
  );
}

/** Slice names listed per reason in the summary; the rest are counted. */
const LISTED_SLICES = 6;

export function countBy(keys: readonly string[]): Array<[string, number]> {
  const counts = new Map<string, number>();
  for (const key of keys) counts.set(key, (counts.get(key) ?? 0) + 1);
  return [...counts.entries()].sort((a, b) => b[1] - a[1]);
}
