import { isSeed } from './seeded-random';
import { InputError } from '../problems';
import type { AssignRule } from './time-scale';

const SHARE_PREFIX = 'share:';

/** What an assignment rule may be, as problems say it. */
export const ASSIGN_RULE_EXPECTED = 'mid-age, whole-range, share:F (0 < F <= 1) or draw';

// A plain decimal such as 0.5 or .75; the range check follows.
const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;

/**
 * The assignment rule named by an option: `mid-age`, `whole-range`, `share:F` (0 < F <= 1, the
 * share of an age range a slice must hold) or `draw` (uses `seed`, an integer 0 … 2^32 − 1).
 * Case and surrounding whitespace are ignored. Throws InputError for anything else.
 */
export function parseAssignRule(text: string, seed: number): AssignRule {
  const option = text.trim().toLowerCase();
  if (option === 'mid-age') return { kind: 'mid-age' };
  if (option === 'whole-range') return { kind: 'whole-range' };
  if (option === 'draw') {
    if (!isSeed(seed)) throw new InputError([{ field: 'seed', value: String(seed), expected: 'an integer from 0 to 4294967295' }]);
    return { kind: 'draw', seed };
  }
  if (option.startsWith(SHARE_PREFIX)) {
    const raw = option.slice(SHARE_PREFIX.length).trim();
    const fraction = DECIMAL.test(raw) ? Number(raw) : Number.NaN;
    if (!(fraction > 0 && fraction <= 1)) {
      throw new InputError([{ field: 'share', value: raw, expected: 'a share of the age range greater than 0 and at most 1, as in share:0.5' }]);
    }
    return { kind: 'share', fraction };
  }
  throw new InputError([{ field: 'rule', value: text, expected: ASSIGN_RULE_EXPECTED }]);
}
