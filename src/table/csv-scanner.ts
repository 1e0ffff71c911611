import { detectDelimiter, type Delimiter } from './delimiter-detection';
import { scanQuotedRecord, scanQuotedSpans, type QuotedRecordState } from './quoted-record';
import { RecordView, type ScannedRecord } from './scanned-record';
import { InputError } from '../problems';
import { excerpt } from './table-problems';

/** Longest record accepted, in characters (1 MiB); a longer one means the input is not a table. */
export const MAX_RECORD_CHARS = 1 << 20;

export interface CsvScannerOptions {
  readonly onRecord: (record: ScannedRecord) => void;
  /** Fixes the delimiter; otherwise the header line decides. */
  readonly delimiter?: Delimiter;
  readonly maxRecordChars?: number;
}

export interface CsvScanner {
  /** Scans a piece of text; records are emitted as soon as they are complete. */
  push(chunk: string): void;
  /** Scans what is left; throws InputError on a quote that is never closed. */
  end(): void;
  /** The delimiter in use, once known. */
  readonly delimiter: Delimiter | undefined;
}

const LF = 10;

/**
 * Streaming CSV/TSV scanner following RFC 4180 §2 (quoted fields, "" inside quotes, delimiters
 * and line breaks inside quotes), accepting CRLF, LF and CR line endings. Lines without a quote
 * take a fast path that splits with indexOf; a trailing line ending yields no empty record.
 */
export function createCsvScanner(options: CsvScannerOptions): CsvScanner {
  return new Scanner(options);
}

class Scanner implements CsvScanner {
  private readonly onRecord: (record: ScannedRecord) => void;
  private readonly max: number;
  private readonly view = new RecordView(() => this.buf.slice(this.recStart, this.recEnd));
  private buf = '';
  /** Start of the text not yet consumed, and the line it starts on. */
  private pos = 0;
  private line = 1;
  private delim = -1;
  private delimChar = '';
  private started = false;
  private ended = false;
  /** Line of a quoted field left open at the end of the buffer (0: none). */
  private openQuoteLine = 0;
  private readonly values: string[] = [];
  private readonly quoted: QuotedRecordState = { end: 0, after: 0, lastLine: 0, problem: undefined, openQuoteLine: 0 };
  private recStart = 0;
  private recEnd = 0;

  constructor(options: CsvScannerOptions) {
    this.onRecord = options.onRecord;
    this.max = options.maxRecordChars ?? MAX_RECORD_CHARS;
    if (options.delimiter !== undefined) this.setDelimiter(options.delimiter);
  }

  get delimiter(): Delimiter | undefined {
    return this.delim < 0 ? undefined : (this.delimChar as Delimiter);
  }

  push(chunk: string): void {
    if (this.ended) throw new Error('csv scanner: push() after end()');
    if (!this.started) {
      if (chunk.length === 0) return;
      this.started = true;
      if (chunk.charCodeAt(0) === 0xfeff) chunk = chunk.slice(1); // byte-order mark, not data
    }
    // `+` would make a V8 cons string, and slicing one a sliced string, on which every
    // charCodeAt pays an indirection; Array.prototype.join writes one flat string.
    this.buf = this.pos < this.buf.length ? [this.buf.slice(this.pos), chunk].join('') : chunk;
    this.pos = 0;
    this.scan(false);
    if (this.buf.length - this.pos > this.max) throw this.tooLong();
  }

  end(): void {
    if (this.ended) return;
    this.ended = true;
    this.scan(true);
  }

  private setDelimiter(d: Delimiter): void {
    this.delimChar = d;
    this.delim = d.charCodeAt(0);
  }

  /**
   * Splits complete records off the buffer. The next LF, CR, quote and delimiter positions are
   * kept between records, so each indexOf passes over any stretch of text once.
   */
  private scan(final: boolean): void {
    const buf = this.buf;
    const n = buf.length;
    let nextLf = -1;
    let nextCr = -1;
    let nextQuote = -1;
    let nextDelim = -1;
    while (this.pos < n) {
      const start = this.pos;
      if (this.delim < 0) {
        const d = detectDelimiter(buf, start, final);
        if (d === undefined) return;
        this.setDelimiter(d);
      }
      if (nextLf < start) nextLf = indexOrEnd(buf, '\n', start);
      if (nextCr < start) nextCr = indexOrEnd(buf, '\r', start);
      if (nextQuote < start) nextQuote = indexOrEnd(buf, '"', start);
      const eol = nextLf < nextCr ? nextLf : nextCr;
      if (nextQuote < eol) {
        if (!this.scanQuoted(final)) return;
        continue;
      }
      let after = eol + 1;
      if (eol === n) {
        if (!final) return;
        after = n;
      } else if (eol === nextCr) {
        if (after === n && !final) return; // the LF of a CRLF may be in the next chunk
        if (buf.charCodeAt(after) === LF) after++;
      }
      const v = this.view;
      let k = 0;
      let s = start;
      for (;;) {
        if (nextDelim < s) nextDelim = indexOrEnd(buf, this.delimChar, s);
        if (nextDelim >= eol) break;
        v.reserve(k);
        v.start[k] = s;
        v.end[k++] = nextDelim;
        s = nextDelim + 1;
      }
      v.reserve(k);
      v.start[k] = s;
      v.end[k++] = eol;
      v.count = k;
      v.text = buf;
      this.emit(start, eol, this.line, undefined);
      this.line++;
      this.pos = after;
    }
  }

  /** A record with a quote: spans of the buffer when no value needs unescaping, else cut values. */
  private scanQuoted(final: boolean): boolean {
    const q = this.quoted;
    const v = this.view;
    if (scanQuotedSpans(this.buf, this.pos, this.line, this.delim, v, q)) {
      v.text = this.buf;
    } else {
      const values = this.values;
      const done = scanQuotedRecord(this.buf, this.pos, this.line, this.delim, final, values, q);
      this.openQuoteLine = q.openQuoteLine;
      if (!done) return false;
      let at = 0;
      for (let k = 0; k < values.length; k++) {
        v.reserve(k);
        v.start[k] = at;
        at += values[k].length;
        v.end[k] = at;
      }
      v.count = values.length;
      v.text = values.join('');
    }
    this.openQuoteLine = 0;
    this.emit(this.pos, q.end, this.line, q.problem);
    this.line = q.lastLine + 1;
    this.pos = q.after;
    return true;
  }

  private emit(start: number, end: number, line: number, problem: string | undefined): void {
    if (end - start > this.max) throw this.tooLong(line, start);
    this.recStart = start;
    this.recEnd = end;
    this.view.line = line;
    this.view.problem = problem;
    this.onRecord(this.view);
  }

  private tooLong(line = this.line, start = this.pos): InputError {
    const value = excerpt(this.buf, start);
    if (this.openQuoteLine > 0) {
      return new InputError([{
        line: this.openQuoteLine, field: 'row', value,
        expected: `a closing quote (") within ${this.max} characters: a quoted field starts on this line and is still open; check for an unbalanced quote`,
      }]);
    }
    return new InputError([{
      line, field: 'row', value,
      expected: `a record of at most ${this.max} characters; this does not look like a table with one record per line`,
    }]);
  }
}

function indexOrEnd(text: string, ch: string, from: number): number {
  const at = text.indexOf(ch, from);
  return at < 0 ? text.length : at;
}
