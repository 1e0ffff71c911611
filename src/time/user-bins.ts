import { EARTH_AGE_MA, WITHIN_EARTH_AGE } from './earth-age';
import { formatMa } from './equal-bins';
import { TimeInputError, type TimeInputProblem } from './time-input-error';
import type { TimeScale } from './time-scale';

/** The columns of a bin table, in any order; no others are accepted. */
export const BIN_COLUMNS = ['name', 'base_ma', 'top_ma'] as const;
type BinColumn = (typeof BIN_COLUMNS)[number];

/** One parsed record of a bin table; the header is line 1. */
export interface BinRecord {
  readonly line: number;
  readonly fields: readonly string[];
}

interface ParsedBin {
  readonly line: number;
  readonly name: string;
  readonly baseMa: number;
  readonly topMa: number;
}

// A plain decimal number; rejects what Number() would quietly accept ('', '0x10', 'Infinity').
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

function columnIndex(header: readonly string[]): Record<BinColumn, number> {
  const found: TimeInputProblem[] = [];
  const index: Record<BinColumn, number> = { name: -1, base_ma: -1, top_ma: -1 };
  header.forEach((cell, i) => {
    const key = cell.trim().toLowerCase();
    if (!(BIN_COLUMNS as readonly string[]).includes(key)) {
      found.push({ line: 1, field: 'header', value: cell, expected: 'only the columns name, base_ma, top_ma' });
    } else if (index[key as BinColumn] >= 0) {
      found.push({ line: 1, field: 'header', value: cell, expected: `the column ${key} only once` });
    } else {
      index[key as BinColumn] = i;
    }
  });
  for (const column of BIN_COLUMNS) {
    if (index[column] < 0) found.push({ line: 1, field: column, value: '', expected: `a column named ${column} in the header` });
  }
  if (found.length > 0) throw new TimeInputError(found);
  return index;
}

function parseAge(line: number, field: BinColumn, raw: string, found: TimeInputProblem[]): number {
  const text = raw.trim();
  if (!DECIMAL.test(text)) {
    found.push({ line, field, value: raw, expected: 'a number in Ma' });
    return Number.NaN;
  }
  const age = Number(text);
  if (age < 0) {
    found.push({ line, field, value: raw, expected: 'an age in Ma of 0 or more' });
    return Number.NaN;
  }
  if (age > EARTH_AGE_MA) {
    found.push({ line, field, value: raw, expected: WITHIN_EARTH_AGE });
    return Number.NaN;
  }
  return age;
}

function parseRecord(record: BinRecord, width: number, index: Record<BinColumn, number>, found: TimeInputProblem[]): ParsedBin | undefined {
  const { line, fields } = record;
  if (fields.length !== width) {
    found.push({ line, field: 'row', value: fields.join(','), expected: `${width} fields, as in the header` });
    return undefined;
  }
  const name = fields[index.name].trim();
  if (name === '') found.push({ line, field: 'name', value: fields[index.name], expected: 'a bin name' });
  const baseMa = parseAge(line, 'base_ma', fields[index.base_ma], found);
  const topMa = parseAge(line, 'top_ma', fields[index.top_ma], found);
  if (baseMa <= topMa) {
    found.push({ line, field: 'base_ma', value: fields[index.base_ma], expected: `an age older than top_ma (${formatMa(topMa)} Ma)` });
  }
  return { line, name, baseMa, topMa };
}

function duplicateNames(bins: readonly ParsedBin[], found: TimeInputProblem[]): void {
  const firstLine = new Map<string, number>();
  for (const bin of bins) {
    const earlier = firstLine.get(bin.name);
    if (earlier === undefined) firstLine.set(bin.name, bin.line);
    else found.push({ line: bin.line, field: 'name', value: bin.name, expected: `a name not already used (line ${earlier} has it)` });
  }
}

function describe(bin: ParsedBin): string {
  return `bin "${bin.name}" (line ${bin.line}, ${formatMa(bin.baseMa)}–${formatMa(bin.topMa)} Ma)`;
}

/**
 * A time scale from a user's bin table with the columns name, base_ma, top_ma (ages in Ma, base
 * older than top). Bins may come in any order and the result is oldest first; gaps between bins
 * are allowed (an age in a gap belongs to no slice), overlaps are not. Throws TimeInputError
 * listing every problem: missing or unknown columns, wrong field count, empty names,
 * non-numeric or negative ages, ages older than the Earth, base not older than top, duplicate
 * names, overlapping bins.
 */
export function binsFromRecords(header: readonly string[], records: readonly BinRecord[], label: string): TimeScale {
  const index = columnIndex(header);
  const found: TimeInputProblem[] = [];
  if (records.length === 0) found.push({ line: 2, field: 'row', value: '', expected: 'at least one bin after the header' });
  const bins = records
    .map((record) => parseRecord(record, header.length, index, found))
    .filter((bin): bin is ParsedBin => bin !== undefined);
  duplicateNames(bins, found);
  if (found.length > 0) throw new TimeInputError(found);

  const sorted = [...bins].sort((a, b) => b.baseMa - a.baseMa);
  // Sorted by base, any overlap shows between neighbours: if bin i overlaps a later bin j,
  // top_i < base_j <= base_(i+1), so it overlaps bin i+1 too.
  for (let i = 0; i + 1 < sorted.length; i++) {
    const older = sorted[i];
    const younger = sorted[i + 1];
    if (younger.baseMa > older.topMa) {
      found.push({ line: younger.line, field: 'base_ma', value: formatMa(younger.baseMa), expected: `no overlap: ${describe(younger)} overlaps ${describe(older)}` });
    }
  }
  if (found.length > 0) throw new TimeInputError(found);
  return {
    label,
    names: sorted.map((bin) => bin.name),
    baseMa: Float64Array.from(sorted, (bin) => bin.baseMa),
    topMa: Float64Array.from(sorted, (bin) => bin.topMa),
  };
}
