import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { describeBadNumber, isBlank, isTrimmable, parseDecimal, parseDecimalSpan, parsePlateId } from '../../src/table/index';

describe('parseDecimal', () => {
  it('reads decimal notation with sign, exponent and surrounding whitespace', () => {
    expect(parseDecimal('12.5')).toBe(12.5);
    expect(parseDecimal(' 12.5 ')).toBe(12.5);
    expect(parseDecimal('-3')).toBe(-3);
    expect(parseDecimal('+3')).toBe(3);
    expect(parseDecimal('1e2')).toBe(100);
    expect(parseDecimal('.5')).toBe(0.5);
    expect(parseDecimal('5.')).toBe(5);
    expect(Object.is(parseDecimal('-0'), -0)).toBe(true);
  });

  it('refuses blanks, decimal commas, NaN, infinities and hexadecimal', () => {
    for (const bad of ['', '  ', '\u00a0', '12,5', 'NaN', 'Infinity', '-Infinity', '1e400', '0x1A', ' 0b11', '0o7', 'abc', '1.2.3', '-', '.', '1_000']) {
      expect(parseDecimal(bad), bad).toBeNaN();
    }
  });

  it('gives exactly the double Number() gives for plain decimals', () => {
    // ECMA-262 Number() (StringToNumber, correctly rounded) as the outside reference; the
    // strings include 15-digit mantissas, where the fast path's exactness argument is tightest.
    const digits = fc.array(fc.integer({ min: 0, max: 9 }), { minLength: 0, maxLength: 17 }).map((d) => d.join(''));
    const decimal = fc
      .tuple(fc.constantFrom('', '-', '+'), digits, fc.boolean(), digits, fc.constantFrom('', 'e3', 'E-2', ' '))
      .map(([sign, a, dot, b, tail]) => `${sign}${a}${dot ? '.' : ''}${dot ? b : ''}${tail}`)
      .filter((s) => /\d/.test(s));
    fc.assert(
      fc.property(decimal, (s) => {
        expect(Object.is(parseDecimal(s), Number(s))).toBe(true);
      }),
      { numRuns: 5000 },
    );
  });

  // Bin tables were read with this regular expression before they shared parseDecimal; kept
  // here to show the one parser reads the same texts, with one documented difference.
  const FORMER_BIN_AGE = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
  const formerBinAge = (text: string): number => (FORMER_BIN_AGE.test(text.trim()) ? Number(text.trim()) : NaN);

  it('reads every text the former bin-table pattern read, to the same number, except overflow', () => {
    // The one difference: a finite-looking text too large for a double (1e400) was read as
    // Infinity there and is refused here.
    expect(formerBinAge('1e400')).toBe(Infinity);
    expect(parseDecimal('1e400')).toBeNaN();
    for (const text of ['0', '-0', '+7', '12.', '.5', '1e3', '1E-3', ' 2.5 ', '\t4', '007', '1e-400']) {
      expect(Object.is(parseDecimal(text), formerBinAge(text)), text).toBe(true);
    }
    for (const text of ['', ' ', '.', '-', '1e', 'e1', '0x10', '1_0', '1,5', 'Infinity', 'NaN', '1.2.3', '--1', '+-1']) {
      expect(formerBinAge(text), text).toBeNaN();
      expect(parseDecimal(text), text).toBeNaN();
    }
    const texts = fc.array(fc.constantFrom(...'0123456789.eE+- x_,'), { maxLength: 12 }).map((c) => c.join(''));
    fc.assert(
      fc.property(texts, (text) => {
        const former = formerBinAge(text);
        const expected = Number.isFinite(former) ? former : NaN;
        expect(Object.is(parseDecimal(text), expected)).toBe(true);
      }),
      { numRuns: 20000 },
    );
  });

  it('reads a span of a longer text like the same text cut out', () => {
    expect(parseDecimalSpan('a,-12.25,b', 2, 8)).toBe(-12.25);
    expect(parseDecimalSpan('a, 7 ,b', 2, 5)).toBe(7);
    expect(parseDecimalSpan('a,,b', 2, 2)).toBeNaN();
  });
});

describe('describeBadNumber', () => {
  const expected = 'decimal degrees from -90 to 90';

  it('says that a decimal point is expected when a comma is used', () => {
    expect(describeBadNumber('lat', '12,5', expected)).toBe(
      'lat "12,5" uses a comma; a decimal point is expected, without thousands separators (decimal degrees from -90 to 90)',
    );
  });

  it('calls NaN and infinities not finite, and anything else not a number', () => {
    expect(describeBadNumber('lat', 'NaN', expected)).toBe('lat "NaN" is not a finite number; expected decimal degrees from -90 to 90');
    expect(describeBadNumber('lat', '-Infinity', expected)).toMatch(/is not a finite number/);
    expect(describeBadNumber('lat', 'abc', expected)).toBe('lat "abc" is not a number; expected decimal degrees from -90 to 90');
  });
});

describe('parsePlateId', () => {
  it('reads whole numbers from 0 to 2^31 - 1 and refuses everything else', () => {
    expect(parsePlateId('0')).toBe(0);
    expect(parsePlateId(' 701 ')).toBe(701);
    expect(parsePlateId('2147483647')).toBe(2147483647);
    for (const bad of ['2147483648', '12.5', '-1', '1e2', 'abc', '', '7a']) expect(parsePlateId(bad), bad).toBe(-1);
  });
});

describe('whitespace', () => {
  it('treats as trimmable exactly the UTF-16 code units that String.prototype.trim removes', () => {
    // ECMA-262 String.prototype.trim, as implemented by the runtime, is the reference.
    for (let c = 0; c <= 0xffff; c++) {
      const ch = String.fromCharCode(c);
      if (isTrimmable(c) !== (ch.trim() === '')) throw new Error(`disagreement at U+${c.toString(16)}`);
    }
    expect(isBlank(' \t\u3000')).toBe(true);
    expect(isBlank(' x ')).toBe(false);
  });
});
