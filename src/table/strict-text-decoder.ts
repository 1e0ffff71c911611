/**
 * Bytes in, text out, with the checks every reader of user files makes: the first bytes are
 * sniffed (UTF-16, archives, binary refused), and the text is decoded strictly (an invalid
 * byte is an error, never a replacement character). Where the bytes come from is the caller's
 * business: a file in Node, a Blob in the browser.
 */
import { InputError } from '../problems';
import { sniffBytes } from './sniff-bytes';
import { invalidUtf8Offset } from './utf8-check';

/** Invalid UTF-8 at `byte` (counting from 0); the caller finds the line (see LineCounter) and reports it. */
export class InvalidUtf8Error extends Error {
  constructor(readonly byte: number) {
    super(`invalid UTF-8 at byte ${byte}`);
    this.name = 'InvalidUtf8Error';
  }

  /** The message for the user, once the line is known. */
  atLine(line: number): InputError {
    return new InputError([{
      line, field: 'encoding', value: `invalid UTF-8 at byte ${this.byte} (counting from 0)`, expected: 'UTF-8 text; save the file as UTF-8',
    }]);
  }
}

export class StrictTextDecoder {
  private readonly decoder = new TextDecoder('utf-8', { fatal: true });
  private previous: Uint8Array = new Uint8Array(0);
  /** Bytes decoded so far. */
  bytesRead = 0;

  /** Text of the next chunk; throws InputError for a refused file, InvalidUtf8Error for a bad byte. */
  decode(chunk: Uint8Array): string {
    if (this.bytesRead === 0) {
      const problem = sniffBytes(chunk);
      if (problem !== undefined) throw new InputError([problem]);
    }
    let text: string;
    try {
      text = this.decoder.decode(chunk, { stream: true });
    } catch {
      throw new InvalidUtf8Error(invalidUtf8Offset(this.previous, chunk, this.bytesRead, false));
    }
    this.bytesRead += chunk.length;
    this.previous = chunk;
    return text;
  }

  /** Text left at the end (a sequence cut off by the end of the input is an InvalidUtf8Error). */
  end(): string {
    try {
      return this.decoder.decode();
    } catch {
      throw new InvalidUtf8Error(invalidUtf8Offset(this.previous, new Uint8Array(0), this.bytesRead, true));
    }
  }
}

/** Counts lines over bytes pushed in order: line breaks are LF, CRLF or a lone CR. */
export class LineCounter {
  /** The line (from 1) the next byte is on. */
  line = 1;
  private lastWasCr = false;

  push(bytes: Uint8Array): void {
    for (let i = 0; i < bytes.length; i++) {
      const c = bytes[i];
      if (c === 13 || (c === 10 && !this.lastWasCr)) this.line++;
      this.lastWasCr = c === 13;
    }
  }
}
