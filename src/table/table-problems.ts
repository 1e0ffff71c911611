/** Problems that stop a whole table being read, shared by every reader of user tables. */
import { InputError, type InputProblem } from '../problems';

/** Characters of a record shown in a problem: enough to find it in the file. */
const EXCERPT_CHARS = 40;

/** The start of the record at `start` in `text`, on one line, cut with `…` when longer. */
export function excerpt(text: string, start: number): string {
  const lineEnd = text.slice(start, start + EXCERPT_CHARS + 1).search(/[\r\n]/);
  const shown = text.slice(start, lineEnd < 0 ? start + EXCERPT_CHARS : start + lineEnd);
  return shown.length < text.length - start ? `${shown}…` : shown;
}

/** A table without a header line: `expected` says what the file should start with. */
export function emptyTableError(expected = 'a header line naming the columns'): InputError {
  return new InputError([{ line: 1, field: 'header', value: '', expected: `${expected} (the file is empty)` }]);
}

/** A record whose quoting is broken (`problem`, from the scanner), where that stops the table being read. */
export function malformedQuotingProblem(line: number, raw: string, problem: string): InputProblem {
  return { line, field: line === 1 ? 'header' : 'row', value: excerpt(raw, 0), expected: `well-formed quoting: ${problem}` };
}
