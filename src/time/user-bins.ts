import { EARTH_AGE_MA, WITHIN_EARTH_AGE } from './earth-age';
import { ProblemList } from '../problems';
import { OTHER_COLUMNS, fieldCountProblem, namedColumns, parseDecimal, type TableRecord } from '../table';
import { formatMa } from './format-ma';
import type { TimeScale } from './time-scale';

/** The columns of a bin table, in any order; no others are accepted. */
export const BIN_COLUMNS = ['name', 'base_ma', 'top_ma'] as const;
type BinColumn = (typeof BIN_COLUMNS)[number];

interface ParsedBin {
  readonly line: number;
  readonly name: string;
  readonly baseMa: number;
  readonly topMa: number;
}

function parseAge(line: number, field: BinColumn, raw: string, found: ProblemList): number {
  const age = parseDecimal(raw);
  if (Number.isNaN(age)) {
    found.add({ line, field, value: raw, expected: 'a number in Ma' });
    return Number.NaN;
  }
  if (age < 0) {
    found.add({ line, field, value: raw, expected: 'an age in Ma of 0 or more' });
    return Number.NaN;
  }
  if (age > EARTH_AGE_MA) {
    found.add({ line, field, value: raw, expected: WITHIN_EARTH_AGE });
    return Number.NaN;
  }
  return age;
}

function parseRecord(record: TableRecord, width: number, index: Readonly<Record<BinColumn, number>>, found: ProblemList): ParsedBin | undefined {
  const { line, fields } = record;
  const miscount = fieldCountProblem(record, width);
  if (miscount !== undefined) {
    found.add(miscount);
    return undefined;
  }
  const name = fields[index.name].trim();
  if (name === '') found.add({ line, field: 'name', value: fields[index.name], expected: 'a bin name' });
  const baseMa = parseAge(line, 'base_ma', fields[index.base_ma], found);
  const topMa = parseAge(line, 'top_ma', fields[index.top_ma], found);
  if (baseMa <= topMa) {
    found.add({ line, field: 'base_ma', value: fields[index.base_ma], expected: `an age older than top_ma (${formatMa(topMa)} Ma)` });
  }
  return { line, name, baseMa, topMa };
}

function duplicateNames(bins: readonly ParsedBin[], found: ProblemList): void {
  const firstLine = new Map<string, number>();
  for (const bin of bins) {
    const earlier = firstLine.get(bin.name);
    if (earlier === undefined) firstLine.set(bin.name, bin.line);
    else found.add({ line: bin.line, field: 'name', value: bin.name, expected: `a name not already used (line ${earlier} has it)` });
  }
}

function describe(bin: ParsedBin): string {
  return `bin "${bin.name}" (line ${bin.line}, ${formatMa(bin.baseMa)}–${formatMa(bin.topMa)} Ma)`;
}

/**
 * A time scale from a user's bin table with the columns name, base_ma, top_ma (ages in Ma, base
 * older than top). Bins may come in any order and the result is oldest first; gaps between bins
 * are allowed (an age in a gap belongs to no slice), overlaps are not. Columns are matched by
 * name as namedColumns does. Throws InputError naming
 * `label` and listing every problem: missing or unknown columns, wrong field count, empty names,
 * non-numeric or negative ages, ages older than the Earth, base not older than top, duplicate names, overlapping bins.
 */
export function binsFromRecords(header: readonly string[], records: readonly TableRecord[], label: string): TimeScale {
  const found = new ProblemList();
  const { index, problems } = namedColumns(header, BIN_COLUMNS, OTHER_COLUMNS.refuse);
  for (const problem of problems) found.add(problem);
  found.throwIfAny(label);
  if (records.length === 0) found.add({ line: 2, field: 'row', value: '', expected: 'at least one bin after the header' });
  const bins = records
    .map((record) => parseRecord(record, header.length, index, found))
    .filter((bin): bin is ParsedBin => bin !== undefined);
  duplicateNames(bins, found);
  found.throwIfAny(label);

  const sorted = [...bins].sort((a, b) => b.baseMa - a.baseMa);
  // Sorted by base, any overlap shows between neighbours: if bin i overlaps a later bin j,
  // top_i < base_j <= base_(i+1), so it overlaps bin i+1 too.
  for (let i = 0; i + 1 < sorted.length; i++) {
    const older = sorted[i];
    const younger = sorted[i + 1];
    if (younger.baseMa > older.topMa) {
      found.add({ line: younger.line, field: 'base_ma', value: formatMa(younger.baseMa), expected: `no overlap: ${describe(younger)} overlaps ${describe(older)}` });
    }
  }
  found.throwIfAny(label);
  return {
    label,
    names: sorted.map((bin) => bin.name),
    baseMa: Float64Array.from(sorted, (bin) => bin.baseMa),
    topMa: Float64Array.from(sorted, (bin) => bin.topMa),
  };
}
