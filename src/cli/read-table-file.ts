import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { InputError } from '../problems';
import { readRawRecords as readRawRecordsOf, readRecords, scanRecords, type TextRecords, type TextSource } from '../run';
import {
  InvalidUtf8Error, LineCounter, StrictTextDecoder, createOccurrenceReader,
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

/** A file's text as a TextSource, with readTableFile's checks (UTF-8 only, read-only). */
export function fileText(path: string, options: StreamOptions = {}): TextSource {
  return (push) => streamText(path, push, options);
}

/** Every record of a small CSV/TSV file (bins, poles…); see readRecords. */
export function readRecordsFile(path: string, options: StreamOptions = {}): Promise<TextRecords> {
  return readRecords(fileText(path, options));
}

/** A user's bin table (`name, base_ma, top_ma`) read from a file; see binsFromRecords. */
export async function readBinsFile(path: string): Promise<TimeScale> {
  const { header, records } = await readRecordsFile(path);
  return binsFromRecords(header, records, path);
}

/** The text of the records starting on the given lines of a file; see readRawRecords in src/run. */
export function readRawRecords(path: string, lines: ReadonlySet<number>): Promise<Map<number, string>> {
  return readRawRecordsOf(fileText(path), lines);
}

/** Every record of a file (header and blank lines included) through `onRecord`; see scanRecords in src/run. */
export function scanRecordsFile(
  path: string, onRecord: (record: ScannedRecord) => void, options: StreamOptions & { readonly delimiter?: Delimiter } = {},
): Promise<void> {
  return scanRecords(fileText(path, options), onRecord, options.delimiter);
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
