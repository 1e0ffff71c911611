import { InputError } from '../problems';
import { createCsvScanner, detach, emptyTableError, malformedQuotingProblem, recordFields, type Delimiter, type ScannedRecord } from '../table';
import type { TextSource } from './text-source';

/** The records of a small CSV/TSV table (bins, poles) as strings, with their lines. */
export interface TextRecords {
  readonly header: readonly string[];
  readonly records: ReadonlyArray<{ readonly line: number; readonly fields: readonly string[] }>;
  /** Empty lines after the header: skipped, counted. */
  readonly blankLines: number;
}

/**
 * An empty line (no character at all before its line ending). The occurrence reader's rule: a
 * line of spaces or a quoted empty field (`""`) is a record, not a blank line.
 */
export function isBlankRecord(record: ScannedRecord): boolean {
  return record.count === 1 && record.end[0] === record.start[0] && record.raw.length === 0;
}

/**
 * Every record of a small table. As for occurrence tables, the first line must be the header
 * (a blank first line is refused), blank lines later are skipped and counted, and malformed
 * quoting is refused with its line.
 */
export async function readRecords(source: TextSource): Promise<TextRecords> {
  let header: string[] | undefined;
  const records: Array<{ line: number; fields: string[] }> = [];
  let blankLines = 0;
  await scanRecords(source, (r) => {
    if (r.problem !== undefined) throw new InputError([malformedQuotingProblem(r.line, detach(r.raw), r.problem)]);
    if (isBlankRecord(r)) {
      if (header === undefined) throw new InputError([{ line: 1, field: 'header', value: '', expected: 'the header naming the columns on the first line (line 1 is blank)' }]);
      blankLines++;
    } else if (header === undefined) header = recordFields(r);
    else records.push({ line: r.line, fields: recordFields(r) });
  });
  if (header === undefined) throw emptyTableError();
  return { header, records, blankLines };
}

/**
 * The text of the records starting on the given lines (without their line endings; quoted line
 * breaks kept), read again from the input to report rows that a later step could not use.
 */
export async function readRawRecords(source: TextSource, lines: ReadonlySet<number>): Promise<Map<number, string>> {
  const found = new Map<number, string>();
  if (lines.size === 0) return found;
  await scanRecords(source, (r) => {
    if (lines.has(r.line)) found.set(r.line, detach(r.raw));
  });
  return found;
}

/**
 * Every record of a text (header and blank lines included) through `onRecord`; `delimiter`
 * fixes the delimiter (else the header line decides).
 */
export async function scanRecords(source: TextSource, onRecord: (record: ScannedRecord) => void, delimiter?: Delimiter): Promise<void> {
  const scanner = createCsvScanner({ onRecord, delimiter });
  await source((text) => scanner.push(text));
  scanner.end();
}
