// Shared helpers for the table tests.
import fc from 'fast-check';
import { createCsvScanner, recordFields, type Delimiter, type ResolveInterval } from '../../src/table/index';

export interface Scanned {
  fields: string[];
  line: number;
  raw: string;
  problem: string | undefined;
}

/** Scans `text` pushed in the given pieces (the whole text when none are given). */
export function scan(text: string | string[], options: { delimiter?: Delimiter; maxRecordChars?: number } = {}): Scanned[] {
  const out: Scanned[] = [];
  const scanner = createCsvScanner({
    ...options,
    onRecord: (r) => out.push({ fields: recordFields(r), line: r.line, raw: r.raw, problem: r.problem }),
  });
  for (const piece of typeof text === 'string' ? [text] : text) scanner.push(piece);
  scanner.end();
  return out;
}

/** Cuts `text` at the given positions (any order, duplicates allowed). */
export function cut(text: string, at: readonly number[]): string[] {
  const points = [...new Set(at.map((p) => Math.min(p, text.length)))].sort((a, b) => a - b);
  const pieces: string[] = [];
  let from = 0;
  for (const p of points) {
    pieces.push(text.slice(from, p));
    from = p;
  }
  pieces.push(text.slice(from));
  return pieces;
}

/** Characters that stress a CSV reader: delimiters, quotes, line breaks, a BOM-like char, non-ASCII. */
const AWKWARD = ['a', 'b', 'Z', ' ', ',', ';', '\t', '"', '\r', '\n', 'é', '\u00a0', '𝔸', '0', '.'];
export const fieldText = fc.array(fc.constantFrom(...AWKWARD), { maxLength: 8 }).map((cs) => cs.join(''));

/** A table as fields plus how to write each field (quoted or not) and each line ending. */
export const csvTable = fc
  .array(fc.array(fc.tuple(fieldText, fc.boolean()), { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 8 })
  .chain((rows) => fc.tuple(fc.constant(rows), fc.array(fc.constantFrom('\n', '\r\n', '\r'), { minLength: rows.length, maxLength: rows.length })));

/**
 * Writes rows as RFC 4180 §2 describes: a field with a delimiter, quote or line break is quoted
 * (quotes doubled); `quote` asks for quoting anyway. A record that is one empty field is written
 * as "" so that it is not read as a blank line.
 */
export function writeCsv(rows: ReadonlyArray<ReadonlyArray<readonly [string, boolean]>>, endings: readonly string[], delimiter = ','): string {
  return rows
    .map((row, i) => {
      const text = row
        .map(([v, quote]) => (quote || /[",;\t\r\n]/.test(v) || (row.length === 1 && v === '') ? `"${v.replace(/"/g, '""')}"` : v))
        .join(delimiter);
      return text + (i < rows.length - 1 ? endings[i] : '');
    })
    .join('');
}

/**
 * Interval lookup stub for the reader tests (the real chart lookup lives in src/time). Ages of
 * the Aptian and Albian from memory of the international chronostratigraphic chart; the tests
 * only check that the looked-up values reach the table.
 */
export const STUB_INTERVALS: Readonly<Record<string, readonly [number, number]>> = {
  Aptian: [121.4, 113.0],
  Albian: [113.0, 100.5],
};
export const resolveStub: ResolveInterval = (name) => {
  const ages = STUB_INTERVALS[name];
  return ages === undefined ? undefined : { baseMa: ages[0], topMa: ages[1] };
};
