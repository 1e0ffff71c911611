import { InputError } from '../problems';
import { parseBinsOption, type ChartScaleRank } from '../time';

/** The time bins of a run: a rank of the built-in chart, equal bins of a width, or the user's own bins table. */
export type BinsChoice =
  | { readonly kind: 'chart'; readonly rank: ChartScaleRank }
  | { readonly kind: 'equal'; readonly widthMyr: number }
  | { readonly kind: 'file' };

/** What a bins setting may say (as text in session files, the address and `--bins`). */
export const BINS_EXPECTED = 'periods, epochs, stages, equal:N (N-Myr bins, e.g. equal:10) or file (an own bins table)';

const OWN_BINS = 'file';

/** Canonical text of a bins choice: `stages`, `equal:10`, `file`. */
export function binsText(choice: BinsChoice): string {
  switch (choice.kind) {
    case 'chart':
      return choice.rank;
    case 'equal':
      return `equal:${choice.widthMyr}`;
    case 'file':
      return OWN_BINS;
  }
}

/** True when `--bins` text names built-in bins rather than a bins table file. */
export function namesBuiltInBins(text: string): boolean {
  return /^\s*(periods|epochs|stages|equal:.*)\s*$/i.test(text);
}

/**
 * The bins choice a text names (case and surrounding whitespace ignored), checked as
 * parseBinsOption checks it; `expected` says what was wrong when it is not one.
 */
export function binsChoiceOf(text: string): BinsChoice | { readonly expected: string } {
  const option = text.trim().toLowerCase();
  if (option === OWN_BINS) return { kind: 'file' };
  try {
    parseBinsOption(option);
  } catch (error) {
    if (error instanceof InputError) return { expected: option.startsWith('equal:') ? error.problems[0].expected : BINS_EXPECTED };
    throw error;
  }
  if (option.startsWith('equal:')) return { kind: 'equal', widthMyr: Number(option.slice('equal:'.length).trim()) };
  return { kind: 'chart', rank: option as ChartScaleRank };
}
