import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import {
  TableReadError, continuationPrefix, createOccurrenceReader, findInvalidUtf8, sniffBytes,
  type OccurrenceReadResult, type OccurrenceReaderOptions,
} from '../table/index';

/** Bytes read at a time. */
export const READ_CHUNK_BYTES = 1 << 20;

export interface ReadTableFileOptions extends OccurrenceReaderOptions {
  /** Called after each chunk with the bytes read so far and the file size. */
  readonly onBytes?: (bytesRead: number, totalBytes: number) => void;
  readonly signal?: AbortSignal;
  /** Bytes per read (READ_CHUNK_BYTES by default); tests use small chunks. */
  readonly chunkBytes?: number;
}

/**
 * Reads an occurrence table from a file: opens it read-only, streams it in chunks, refuses
 * UTF-16 and binary files from their first bytes, decodes UTF-8 strictly (an invalid byte is an
 * error naming its offset and line, never a replacement character) and feeds the reader.
 * Throws TableReadError for a file that cannot be read as a whole.
 */
export async function readTableFile(path: string, options: ReadTableFileOptions): Promise<OccurrenceReadResult> {
  const totalBytes = await stat(path).then((s) => s.size, (err: unknown) => { throw cannotOpen(path, err); });
  const reader = createOccurrenceReader(options);
  const decoder = new TextDecoder('utf-8', { fatal: true });
  const stream = createReadStream(path, { flags: 'r', highWaterMark: options.chunkBytes ?? READ_CHUNK_BYTES, signal: options.signal });
  let offset = 0;
  let previous: Uint8Array = new Uint8Array(0);
  try {
    for await (const chunk of stream as AsyncIterable<Buffer>) {
      if (offset === 0) {
        const problem = sniffBytes(chunk);
        if (problem !== undefined) throw new TableReadError(problem);
      }
      let text: string;
      try {
        text = decoder.decode(chunk, { stream: true });
      } catch {
        throw await invalidUtf8(path, previous, chunk, offset, false);
      }
      reader.push(text);
      offset += chunk.length;
      previous = chunk;
      options.onBytes?.(offset, totalBytes);
    }
  } catch (err) {
    stream.destroy();
    if (err instanceof TableReadError || (err instanceof Error && err.name === 'AbortError')) throw err;
    throw cannotOpen(path, err);
  }
  let rest: string;
  try {
    rest = decoder.decode();
  } catch {
    throw await invalidUtf8(path, previous, new Uint8Array(0), offset, true);
  }
  reader.push(rest);
  return reader.end();
}

function cannotOpen(path: string, err: unknown): TableReadError {
  const why = err instanceof Error ? err.message : String(err);
  return new TableReadError(`cannot read ${path}: ${why}`);
}

/**
 * The decoder failed on `chunk` (which starts at byte `offset`); the ill-formed sequence may have
 * begun in the tail of the previous chunk. Finds its byte offset and the line it is on.
 */
async function invalidUtf8(
  path: string, previous: Uint8Array, chunk: Uint8Array, offset: number, final: boolean,
): Promise<TableReadError> {
  const tail = previous.subarray(Math.max(0, previous.length - 4));
  const joined = new Uint8Array(tail.length + chunk.length);
  joined.set(tail);
  joined.set(chunk, tail.length);
  const from = continuationPrefix(joined);
  const at = findInvalidUtf8(joined.subarray(from), final);
  const byte = offset - tail.length + from + Math.max(at, 0);
  const line = await lineAtByte(path, byte);
  return new TableReadError(`line ${line}: invalid UTF-8 at byte ${byte} (counting from 0); save the file as UTF-8`, line);
}

/** Line (from 1) holding byte `byte`: line breaks before it are LF, CRLF or a lone CR. */
async function lineAtByte(path: string, byte: number): Promise<number> {
  let line = 1;
  let lastWasCr = false;
  if (byte === 0) return line;
  for await (const chunk of createReadStream(path, { flags: 'r', start: 0, end: byte - 1 }) as AsyncIterable<Buffer>) {
    for (let i = 0; i < chunk.length; i++) {
      const c = chunk[i];
      if (c === 10) {
        if (!lastWasCr) line++;
      } else if (c === 13) line++;
      lastWasCr = c === 13;
    }
  }
  return line;
}
