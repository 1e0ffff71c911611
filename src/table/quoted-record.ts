import type { RecordView } from './scanned-record';
import { InputError } from '../problems';
import { excerpt } from './table-problems';

const LF = 10;
const CR = 13;
const QUOTE = 34;

/** Outcome of scanQuotedRecord, written into a reused object. */
export interface QuotedRecordState {
  /** End of the record text (its line ending excluded) and start of the next record. */
  end: number;
  after: number;
  /** Line on which the record ends. */
  lastLine: number;
  problem: string | undefined;
  /** Line of a quoted field still open where the text ran out (0: none). */
  openQuoteLine: number;
}

/**
 * Reads one record that contains a double quote, following RFC 4180 §2: a field that starts
 * with a quote runs to the matching quote, "" inside stands for one quote, and delimiters and
 * line breaks inside are data. A quote inside an unquoted field is kept as written. Fills
 * `fields`; returns false when the record runs past the end of `text` and more may follow.
 */
export function scanQuotedRecord(
  text: string, start: number, line: number, delim: number, final: boolean,
  fields: string[], out: QuotedRecordState,
): boolean {
  const n = text.length;
  let k = 0;
  let i = start;
  out.problem = undefined;
  out.openQuoteLine = 0;
  for (;;) {
    let value: string;
    if (i < n && text.charCodeAt(i) === QUOTE) {
      const quoteLine = line;
      value = '';
      let j = i + 1;
      for (;;) {
        const q = text.indexOf('"', j);
        if (q < 0 || (q + 1 === n && !final)) {
          if (q < 0 && final) throw unbalancedQuote(quoteLine, text, i);
          out.openQuoteLine = quoteLine;
          return false;
        }
        line += countLineBreaks(text, j, q);
        if (text.charCodeAt(q + 1) === QUOTE) {
          value += text.slice(j, q + 1);
          j = q + 2;
          continue;
        }
        value += text.slice(j, q);
        i = q + 1;
        break;
      }
      const stop = fieldEnd(text, i, delim);
      if (stop > i) {
        // RFC 4180 §2 allows only a delimiter or a line ending after a closing quote.
        out.problem ??= `field ${k + 1} has text after its closing quote; a quote inside a quoted value is written as ""`;
        value += text.slice(i, stop);
        i = stop;
      }
    } else {
      const stop = fieldEnd(text, i, delim);
      value = text.slice(i, stop);
      i = stop;
    }
    fields[k++] = value;
    if (i < n && text.charCodeAt(i) === delim) {
      i++;
      continue;
    }
    let after = i + 1;
    if (i === n) {
      if (!final) return false;
      after = n;
    } else if (text.charCodeAt(i) === CR) {
      if (after === n && !final) return false; // the LF of a CRLF may follow in the next chunk
      if (text.charCodeAt(after) === LF) after++;
    }
    fields.length = k;
    out.end = i;
    out.after = after;
    out.lastLine = line;
    return true;
  }
}

/**
 * The common case of scanQuotedRecord without cutting strings: when no quoted field holds ""
 * or text after its closing quote, every value is a span of `text`, written into `view`.
 * Returns false, with `out` partly written, when the record needs scanQuotedRecord: such a
 * field, or a record that runs past the end of `text`.
 */
export function scanQuotedSpans(
  text: string, start: number, line: number, delim: number,
  view: RecordView, out: QuotedRecordState,
): boolean {
  const n = text.length;
  let k = 0;
  let i = start;
  for (;;) {
    let from = i;
    let to: number;
    if (i < n && text.charCodeAt(i) === QUOTE) {
      from = i + 1;
      to = text.indexOf('"', from);
      if (to < 0 || to + 1 === n || text.charCodeAt(to + 1) === QUOTE) return false;
      line += countLineBreaks(text, from, to);
      i = to + 1;
      const c = text.charCodeAt(i);
      if (c !== delim && c !== LF && c !== CR) return false;
    } else {
      i = fieldEnd(text, i, delim);
      to = i;
    }
    view.reserve(k);
    view.start[k] = from;
    view.end[k++] = to;
    if (i < n && text.charCodeAt(i) === delim) {
      i++;
      continue;
    }
    if (i === n || (text.charCodeAt(i) === CR && i + 1 === n)) return false;
    view.count = k;
    out.end = i;
    out.after = text.charCodeAt(i) === CR && text.charCodeAt(i + 1) === LF ? i + 2 : i + 1;
    out.lastLine = line;
    out.problem = undefined;
    out.openQuoteLine = 0;
    return true;
  }
}

function unbalancedQuote(line: number, text: string, fieldStart: number): InputError {
  return new InputError([{
    line, field: 'row', value: excerpt(text, fieldStart),
    expected: 'a closing quote for the quoted field that starts on this line, which is never closed (unbalanced quote; a quote inside a quoted value is written as "")',
  }]);
}

/** Position of the next delimiter or line end at or after i (text.length when none). */
function fieldEnd(text: string, i: number, delim: number): number {
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === delim || c === LF || c === CR) return i;
  }
  return i;
}

/** Line breaks in text[from, to): LF, CRLF and a lone CR count one each. */
function countLineBreaks(text: string, from: number, to: number): number {
  let breaks = 0;
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i);
    if (c === LF || (c === CR && text.charCodeAt(i + 1) !== LF)) breaks++;
  }
  return breaks;
}
