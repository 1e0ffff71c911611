import { isSeed } from './seeded-random';
import { InputError } from '../problems';
import type { AssignRule } from './time-scale';

const OVERLAP_PREFIX = 'overlap:';

// A plain decimal such as 0.5 or .75; the range check follows.
const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;

/**
 * The assignment rule named by an option: `midpoint`, `within`, `overlap:F` (0 < F <= 1, the
 * share of an age range a slice must hold) or `random` (uses `seed`, an integer 0 … 2^32 − 1).
 * Case and surrounding whitespace are ignored. Throws InputError for anything else.
 */
export function parseAssignRule(text: string, seed: number): AssignRule {
  const option = text.trim().toLowerCase();
  if (option === 'midpoint') return { kind: 'midpoint' };
  if (option === 'within') return { kind: 'within' };
  if (option === 'random') {
    if (!isSeed(seed)) throw new InputError([{ field: 'seed', value: String(seed), expected: 'an integer from 0 to 4294967295' }]);
    return { kind: 'random', seed };
  }
  if (option.startsWith(OVERLAP_PREFIX)) {
    const raw = option.slice(OVERLAP_PREFIX.length).trim();
    const fraction = DECIMAL.test(raw) ? Number(raw) : Number.NaN;
    if (!(fraction > 0 && fraction <= 1)) {
      throw new InputError([{ field: 'overlap', value: raw, expected: 'a share of the age range greater than 0 and at most 1, as in overlap:0.5' }]);
    }
    return { kind: 'overlap', fraction };
  }
  throw new InputError([{ field: 'rule', value: text, expected: 'midpoint, within, overlap:F (0 < F <= 1) or random' }]);
}
