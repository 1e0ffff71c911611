/**
 * Streams a picked file (or a file the app serves itself) as UTF-8 text, chunk by chunk, with
 * the command line's checks: UTF-16 and binary files refused from their first bytes, invalid
 * UTF-8 an error naming its byte offset and line, never a replacement character.
 */
import type { TextSource } from '../../src/run';
import { InvalidUtf8Error, LineCounter, StrictTextDecoder } from '../../src/table';
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
  const decoder = new StrictTextDecoder();
  const reader = blob.stream().getReader();
  try {
    for (;;) {
      if (signal?.aborted === true) throw new CancelledError();
      const { done, value } = await reader.read();
      if (done) break;
      push(decoder.decode(value));
      onBytes?.(decoder.bytesRead, blob.size);
    }
    push(decoder.end());
  } catch (error) {
    if (!(error instanceof InvalidUtf8Error)) throw error;
    const lines = new LineCounter();
    lines.push(new Uint8Array(await blob.slice(0, error.byte).arrayBuffer()));
    throw error.atLine(lines.line);
  } finally {
    reader.releaseLock();
  }
}

/** A Blob's text as a TextSource, with streamText's checks. */
export function blobText(blob: Blob): TextSource {
  return (push) => streamText(blob, { push });
}

/** SHA-256 of the bytes, lower-case hex (for the session file). */
export async function sha256Hex(blob: Blob): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', await blob.arrayBuffer()));
  let hex = '';
  for (const byte of digest) hex += byte.toString(16).padStart(2, '0');
  return hex;
}
