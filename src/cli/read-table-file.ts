import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { InputError } from '../problems';
import {
  InvalidUtf8Error, LineCounter, StrictTextDecoder, createCsvScanner, createOccurrenceReader, detach, emptyTableError, malformedQuotingProblem, recordFields,
  type Delimiter, type OccurrenceReadResult, type OccurrenceReaderOptions, type ScannedRecord,
} from '../table/index';
import { binsFromRecords, type TimeScale } from '../time/index';

/** Bytes read at a time. */
export const READ_CHUNK_BYTES = 1 << 20;

/** How a file is streamed. */
export interface StreamOptions {
  /** Called after each chunk with the bytes read so far and the file size. */
  readonly onBytes?: (bytesRead: number, totalBytes: number) => void;
  /** Sees every chunk of raw bytes as read (to hash the file in the same pass). */
  readonly onChunk?: (bytes: Uint8Array) => void;
  readonly signal?: AbortSignal;
  /** Bytes per read (READ_CHUNK_BYTES by default); tests use small chunks. */
  readonly chunkBytes?: number;
}

export interface ReadTableFileOptions extends OccurrenceReaderOptions, StreamOptions {}

/**
 * Reads an occurrence table from a file: opens it read-only, streams it in chunks, refuses
 * UTF-16 and binary files from their first bytes, decodes UTF-8 strictly (an invalid byte is an
 * error naming its offset and line, never a replacement character) and feeds the reader.
 * Throws InputError for a file that cannot be read as a whole.
 */
export async function readTableFile(path: string, options: ReadTableFileOptions): Promise<OccurrenceReadResult> {
  const reader = createOccurrenceReader(options);
  await streamText(path, (text) => reader.push(text), options);
  return reader.end();
}

/** The records of a small CSV/TSV file (bins, poles…) as strings; blank lines are counted, not kept. */
export interface TextRecords {
  readonly header: readonly string[];
  readonly records: ReadonlyArray<{ readonly line: number; readonly fields: readonly string[] }>;
  readonly blankLines: number;
}

/** Reads every record of a CSV/TSV file with the same checks as readTableFile (for small tables). */
export async function readRecordsFile(path: string, options: StreamOptions = {}): Promise<TextRecords> {
  let header: string[] | undefined;
  const records: Array<{ line: number; fields: string[] }> = [];
  let blankLines = 0;
  const scanner = createCsvScanner({
    onRecord: (r) => {
      if (r.problem !== undefined) throw new InputError([malformedQuotingProblem(r.line, detach(r.raw), r.problem)]);
      if (r.count === 1 && r.end[0] === r.start[0] && r.raw.length === 0) blankLines++;
      else if (header === undefined) header = recordFields(r);
      else records.push({ line: r.line, fields: recordFields(r) });
    },
  });
  await streamText(path, (text) => scanner.push(text), options);
  scanner.end();
  if (header === undefined) throw emptyTableError();
  return { header, records, blankLines };
}

/** A user's bin table (`name, base_ma, top_ma`) read from a file; see binsFromRecords. */
export async function readBinsFile(path: string): Promise<TimeScale> {
  const { header, records } = await readRecordsFile(path);
  return binsFromRecords(header, records, path);
}

/**
 * The text of the records starting on the given lines, read again from the file (without their
 * line endings), for reporting rows that a later step could not use.
 */
export async function readRawRecords(path: string, lines: ReadonlySet<number>): Promise<Map<number, string>> {
  const found = new Map<number, string>();
  await scanRecordsFile(path, (r) => {
    if (lines.has(r.line)) found.set(r.line, detach(r.raw));
  });
  return found;
}

/**
 * Streams every record of a file (header and blank lines included) through `onRecord`, with the
 * checks of readTableFile; `delimiter` fixes the delimiter (else the header line decides).
 */
export async function scanRecordsFile(
  path: string, onRecord: (record: ScannedRecord) => void, options: StreamOptions & { readonly delimiter?: Delimiter } = {},
): Promise<void> {
  const scanner = createCsvScanner({ onRecord, delimiter: options.delimiter });
  await streamText(path, (text) => scanner.push(text), options);
  scanner.end();
}

/** Streams a file's text, chunk by chunk, refusing what is not UTF-8 text. */
async function streamText(path: string, push: (text: string) => void, options: StreamOptions): Promise<void> {
  const totalBytes = await stat(path).then((s) => s.size, (err: unknown) => { throw cannotOpen(path, err); });
  const decoder = new StrictTextDecoder();
  const stream = createReadStream(path, { flags: 'r', highWaterMark: options.chunkBytes ?? READ_CHUNK_BYTES, signal: options.signal });
  try {
    for await (const chunk of stream as AsyncIterable<Buffer>) {
      const text = decoder.decode(chunk);
      options.onChunk?.(chunk);
      push(text);
      options.onBytes?.(decoder.bytesRead, totalBytes);
    }
    push(decoder.end());
  } catch (err) {
    stream.destroy();
    if (err instanceof InvalidUtf8Error) throw err.atLine(await lineAtByte(path, err.byte));
    if (err instanceof InputError || (err instanceof Error && err.name === 'AbortError')) throw err;
    throw cannotOpen(path, err);
  }
}

function cannotOpen(path: string, err: unknown): InputError {
  const why = err instanceof Error ? err.message : String(err);
  return new InputError([{ field: 'file', value: path, expected: `a file that can be read (${why})` }]);
}

/** Line (from 1) holding byte `byte` of the file. */
async function lineAtByte(path: string, byte: number): Promise<number> {
  const lines = new LineCounter();
  if (byte === 0) return lines.line;
  for await (const chunk of createReadStream(path, { flags: 'r', start: 0, end: byte - 1 }) as AsyncIterable<Buffer>) lines.push(chunk);
  return lines.line;
}
