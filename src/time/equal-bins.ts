import { InputError, type InputProblem } from '../problems';
import { decimalMa, formatMa } from './format-ma';
import type { TimeScale } from './time-scale';

/** Most bins equalBins makes; more almost always means a unit slip (years given for Myr). */
export const MAX_EQUAL_BINS = 100_000;

function problems(widthMa: number, oldestMa: number, youngestMa: number): InputProblem[] {
  const found: InputProblem[] = [];
  if (!Number.isFinite(widthMa) || widthMa <= 0) {
    found.push({ field: 'equal', value: String(widthMa), expected: 'a bin width in Myr greater than 0' });
  }
  if (!Number.isFinite(youngestMa) || youngestMa < 0) {
    found.push({ field: 'youngest age', value: String(youngestMa), expected: 'an age in Ma of 0 or more' });
  }
  if (!Number.isFinite(oldestMa) || !(oldestMa > youngestMa)) {
    found.push({
      field: 'oldest age',
      value: String(oldestMa),
      expected: `an age in Ma older than the youngest age (${youngestMa})`,
    });
  }
  return found;
}

/**
 * Bins `widthMa` Myr wide whose boundaries are multiples of the width (anchored at 0 Ma), just
 * enough of them to cover youngestMa..oldestMa. Oldest first, named like `120–110 Ma`, labelled
 * `equal:10`. Throws InputError for a width that is not a positive number, a negative
 * youngest age, an oldest age not older than the youngest, or more than MAX_EQUAL_BINS bins.
 */
export function equalBins(widthMa: number, oldestMa: number, youngestMa = 0): TimeScale {
  const found = problems(widthMa, oldestMa, youngestMa);
  if (found.length > 0) throw new InputError(found);
  // Boundaries are k × width, each rounded to the decimal multiple the user means.
  const lowest = Math.floor(decimalMa(youngestMa / widthMa));
  const highest = Math.ceil(decimalMa(oldestMa / widthMa));
  const count = highest - lowest;
  if (count > MAX_EQUAL_BINS) {
    throw new InputError([
      {
        field: 'equal',
        value: formatMa(widthMa),
        expected: `a width giving at most ${MAX_EQUAL_BINS} bins over ${formatMa(youngestMa)}–${formatMa(oldestMa)} Ma (this one gives ${count})`,
      },
    ]);
  }
  const names: string[] = [];
  const baseMa = new Float64Array(count);
  const topMa = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const k = highest - i;
    baseMa[i] = decimalMa(k * widthMa);
    topMa[i] = decimalMa((k - 1) * widthMa);
    names.push(`${formatMa(baseMa[i])}–${formatMa(topMa[i])} Ma`);
  }
  return { label: `equal:${formatMa(widthMa)}`, names, baseMa, topMa };
}
