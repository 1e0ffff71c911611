import { mapColumns, type ColumnMapping } from './column-mapping';
import { createCsvScanner } from './csv-scanner';
import type { Delimiter } from './delimiter-detection';
import { createRowValues, readRow, type ResolveInterval } from './occurrence-row';
import type { OccurrenceTable, RejectedRow } from './occurrence-table';
import { recordFields, type ScannedRecord } from './scanned-record';
import { detach } from './string-dictionary';
import { OccurrenceTableBuilder } from './table-builder';
import { InputError } from '../problems';
import { emptyTableError, malformedQuotingProblem } from './table-problems';

export interface OccurrenceReaderOptions {
  /** Explicit `field: column name` pairs; they win over synonyms. */
  readonly mapping?: Readonly<Record<string, string>>;
  /** Age range of a named interval of the time chart. */
  readonly resolveInterval: ResolveInterval;
  /** Called after each pushed chunk with the number of data records read so far. */
  readonly onProgress?: (rowsRead: number) => void;
  /** Fixes the delimiter instead of detecting it from the header line. */
  readonly delimiter?: Delimiter;
  /** Longest record accepted, in characters (MAX_RECORD_CHARS by default). */
  readonly maxRecordChars?: number;
}

export interface OccurrenceReadResult {
  readonly table: OccurrenceTable;
  readonly rejects: readonly RejectedRow[];
  /** Data records read, accepted or rejected; the header and blank lines not counted. */
  readonly rowsRead: number;
  /** Empty lines passed over (they hold no data). */
  readonly blankLines: number;
  readonly columns: ColumnMapping;
  readonly delimiter: Delimiter;
}

export interface OccurrenceReader {
  push(chunk: string): void;
  /** Finishes reading; throws InputError when the table as a whole cannot be read. */
  end(): OccurrenceReadResult;
}

const DELIMITER_NAMES: Readonly<Record<Delimiter, string>> = { ',': 'comma', '\t': 'tab', ';': 'semicolon' };

/**
 * Reads an occurrence table from text chunks: the first record is the header (mapped with
 * mapColumns), every later record becomes a row of the table or a RejectedRow with its reason.
 */
export function createOccurrenceReader(options: OccurrenceReaderOptions): OccurrenceReader {
  const { resolveInterval, onProgress } = options;
  const rejects: RejectedRow[] = [];
  const row = createRowValues();
  let columns: ColumnMapping | undefined;
  let builder: OccurrenceTableBuilder | undefined;
  let rowsRead = 0;
  let blankLines = 0;

  const reject = (record: ScannedRecord, field: string, reason: string): void => {
    rejects.push({ line: record.line, field, reason, original: detach(record.raw) });
  };

  const onRecord = (record: ScannedRecord): void => {
    if (record.count === 1 && record.end[0] === record.start[0] && record.raw.length === 0) {
      if (columns === undefined) {
        throw new InputError([{ line: 1, field: 'header', value: '', expected: 'the header naming the columns on the first line (line 1 is blank)' }]);
      }
      blankLines++;
      return;
    }
    if (columns === undefined || builder === undefined) {
      if (record.problem !== undefined) throw new InputError([malformedQuotingProblem(record.line, detach(record.raw), record.problem)]);
      columns = mapColumns(recordFields(record), options.mapping);
      builder = new OccurrenceTableBuilder(columns.index);
      return;
    }
    rowsRead++;
    const width = columns.header.length;
    if (record.problem !== undefined) {
      reject(record, 'row', `malformed quoting: ${record.problem}`);
    } else if (record.count !== width) {
      reject(record, 'row', fieldCountReason(record.count, width, scanner.delimiter ?? ','));
    } else {
      const problem = readRow(record, columns.index, resolveInterval, row);
      if (problem === undefined) builder.append(record, row);
      else reject(record, problem.field, problem.reason);
    }
  };

  const scanner = createCsvScanner({ onRecord, delimiter: options.delimiter, maxRecordChars: options.maxRecordChars });

  return {
    push(chunk: string): void {
      scanner.push(chunk);
      onProgress?.(rowsRead);
    },
    end(): OccurrenceReadResult {
      scanner.end();
      if (columns === undefined || builder === undefined) throw emptyTableError('a header line naming the columns, then data rows');
      if (rowsRead === 0) throw new InputError([{ line: 2, field: 'row', value: '', expected: 'data rows after the header (the file has a header but no data rows)' }]);
      onProgress?.(rowsRead);
      return { table: builder.finish(), rejects, rowsRead, blankLines, columns, delimiter: scanner.delimiter ?? ',' };
    },
  };
}

function fieldCountReason(n: number, width: number, delimiter: Delimiter): string {
  const hint = n > width
    ? `a value containing a ${DELIMITER_NAMES[delimiter]} must be enclosed in double quotes`
    : 'a value is missing, or a line break inside a value is not enclosed in double quotes';
  return `record has ${n} field${n === 1 ? '' : 's'} but the header has ${width}; ${hint}`;
}
