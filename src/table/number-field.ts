import { trimmedStart } from './text-span';

/** True when a field holds nothing but whitespace. */
export function isBlank(text: string): boolean {
  return trimmedStart(text, 0, text.length) === text.length;
}

/** Powers of ten that are exact doubles (10^0 … 10^15). */
const POW10 = Array.from({ length: 16 }, (_, k) => 10 ** k);
/** Most significant digits read on the fast path: 10^15 < 2^53, so the digits form an exact integer. */
const FAST_DIGITS = 15;

/**
 * The number written in `text` in decimal notation (`12.5`, ` 12.5 `, `-3`, `1e2`, `.5`), or
 * NaN. Surrounding whitespace is allowed; blank text, `NaN`, `Infinity`, numbers too large for
 * a double, and the `0x`/`0o`/`0b` forms that Number() would also read are not numbers here.
 */
export function parseDecimal(text: string): number {
  return parseDecimalSpan(text, 0, text.length);
}

/**
 * parseDecimal of text[start, end). Plain `[-+]digits[.digits]` with at most 15 digits is read
 * here: the digits as an exact integer divided by an exact power of ten is one correctly rounded
 * operation, so the result is the nearest double, as Number() gives (Clinger 1990, "How to read
 * floating point numbers accurately", the fast path). Anything else goes through Number().
 */
export function parseDecimalSpan(text: string, start: number, end: number): number {
  let i = start;
  const sign = text.charCodeAt(start);
  if (sign === 45 || sign === 43) i++;
  let m = 0;
  let digits = 0;
  let scale = 0;
  let dot = false;
  for (; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      m = m * 10 + (c - 48);
      digits++;
      if (dot) scale++;
    } else if (c === 46 && !dot) dot = true;
    else break;
  }
  if (i === end && digits > 0 && digits <= FAST_DIGITS) {
    const v = scale === 0 ? m : m / POW10[scale];
    return sign === 45 ? -v : v;
  }
  return parseDecimalSlow(text.slice(start, end));
}

function parseDecimalSlow(text: string): number {
  if (text.length === 0) return NaN;
  const v = Number(text);
  if (v - v !== 0) return NaN; // NaN and ±Infinity
  let p = 0;
  const c = text.charCodeAt(0);
  if (c <= 32 || c >= 0x80) {
    p = trimmedStart(text, 0, text.length);
    if (p === text.length) return NaN; // Number() reads blank text as 0
  }
  if (text.charCodeAt(p) === 48) {
    const x = text.charCodeAt(p + 1) | 0x20; // lower case
    if (x === 0x78 || x === 0x6f || x === 0x62) return NaN;
  }
  return v;
}

const DECIMAL_COMMA = /^\s*[-+]?(\d+,\d*|,\d+)\s*$/;
const NOT_FINITE = /^\s*[-+]?(nan|inf|infinity|\d+(\.\d*)?e\d{3,})\s*$/i;

/** Why parseDecimal refused `text` in `field`, saying what was expected. */
export function describeBadNumber(field: string, text: string, expected: string): string {
  const shown = JSON.stringify(text.trim());
  if (DECIMAL_COMMA.test(text)) {
    return `${field} ${shown} uses a comma; a decimal point is expected, without thousands separators (${expected})`;
  }
  if (NOT_FINITE.test(text)) return `${field} ${shown} is not a finite number; expected ${expected}`;
  return `${field} ${shown} is not a number; expected ${expected}`;
}

const PLATE_ID = /^\s*\+?\d+\s*$/;
/** Largest plate id stored (Int32Array). */
export const MAX_PLATE_ID = 0x7fffffff;

/** A plate id written as a whole number from 0 to MAX_PLATE_ID (whitespace around allowed), or -1. */
export function parsePlateId(text: string): number {
  return parsePlateIdSpan(text, 0, text.length);
}

/** parsePlateId of text[start, end). */
export function parsePlateIdSpan(text: string, start: number, end: number): number {
  let v = 0;
  for (let i = start; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c < 48 || c > 57 || i - start >= 10) {
      const slice = text.slice(start, end);
      if (!PLATE_ID.test(slice)) return -1;
      v = Number(slice);
      break;
    }
    v = v * 10 + (c - 48);
  }
  return end > start && v <= MAX_PLATE_ID ? v : -1;
}
