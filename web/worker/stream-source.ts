/**
 * Streams a picked file (or a file the app serves itself) as UTF-8 text, chunk by chunk, with
 * the command line's checks: UTF-16 and binary files refused from their first bytes, invalid
 * UTF-8 an error naming its byte offset and line, never a replacement character.
 */
import { TableReadError, invalidUtf8Offset, sniffBytes } from '../../src/table';
import type { Source } from '../protocol';

export interface StreamCallbacks {
  readonly push: (text: string) => void;
  readonly onBytes?: (bytesRead: number, totalBytes: number) => void;
  readonly signal?: AbortSignal;
}

/** Thrown when the user cancels; the worker answers `cancelled`, not an error. */
export class CancelledError extends Error {
  constructor() {
    super('cancelled');
    this.name = 'CancelledError';
  }
}

export function sourceName(source: Source): string {
  return source.kind === 'file' ? source.file.name : source.name;
}

/** The source's bytes as a Blob (a served file is fetched from the page's own origin). */
export async function sourceBlob(source: Source): Promise<Blob> {
  if (source.kind === 'file') return source.file;
  const response = await fetch(source.url);
  if (!response.ok) throw new Error(`${source.name}: the app could not load it (HTTP ${response.status})`);
  return response.blob();
}

export async function streamText(blob: Blob, callbacks: StreamCallbacks): Promise<void> {
  const { push, onBytes, signal } = callbacks;
  const decoder = new TextDecoder('utf-8', { fatal: true });
  const reader = blob.stream().getReader();
  let offset = 0;
  let previous = new Uint8Array(0);
  try {
    for (;;) {
      if (signal?.aborted === true) throw new CancelledError();
      const { done, value } = await reader.read();
      if (done) break;
      if (offset === 0) {
        const problem = sniffBytes(value);
        if (problem !== undefined) throw new TableReadError(problem);
      }
      let text: string;
      try {
        text = decoder.decode(value, { stream: true });
      } catch {
        throw await invalidUtf8(blob, previous, value, offset, false);
      }
      push(text);
      offset += value.length;
      previous = value;
      onBytes?.(offset, blob.size);
    }
  } finally {
    reader.releaseLock();
  }
  let rest: string;
  try {
    rest = decoder.decode();
  } catch {
    throw await invalidUtf8(blob, previous, new Uint8Array(0), offset, true);
  }
  push(rest);
}

/** The decoder failed on `chunk` (starting at byte `offset`); the bad sequence may start in the previous chunk's tail. */
async function invalidUtf8(blob: Blob, previous: Uint8Array, chunk: Uint8Array, offset: number, final: boolean): Promise<TableReadError> {
  const byte = invalidUtf8Offset(previous, chunk, offset, final);
  const line = lineAtByte(new Uint8Array(await blob.slice(0, byte).arrayBuffer()));
  return new TableReadError(`line ${line}: invalid UTF-8 at byte ${byte} (counting from 0); save the file as UTF-8`, line);
}

/** Line (from 1) that follows these bytes: line breaks are LF, CRLF or a lone CR. */
function lineAtByte(before: Uint8Array): number {
  let line = 1;
  for (let i = 0; i < before.length; i++) {
    const c = before[i];
    if (c === 13 || (c === 10 && before[i - 1] !== 13)) line++;
  }
  return line;
}

/** SHA-256 of the bytes, lower-case hex (for the session file). */
export async function sha256Hex(blob: Blob): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', await blob.arrayBuffer()));
  let hex = '';
  for (const byte of digest) hex += byte.toString(16).padStart(2, '0');
  return hex;
}
