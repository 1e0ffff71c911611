import { describe, expect, it } from 'vitest';
import { PHANEROZOIC_BASE_MA, parseAssignRule, parseBinsOption } from '../../src/time';

// Option grammar is our own (README); the checks are the documented forms.

describe('the bins option', () => {
  it('names the chart scales, ignoring case and surrounding whitespace', () => {
    expect(parseBinsOption('stages').names).toHaveLength(102);
    expect(parseBinsOption(' Periods ').label).toBe('periods');
    expect(parseBinsOption('EPOCHS').names[0]).toBe('Terreneuvian');
  });

  it('makes equal bins over the Phanerozoic by default, or up to a given age', () => {
    const scale = parseBinsOption('equal:10');
    expect(PHANEROZOIC_BASE_MA).toBe(538.8);
    expect(scale.label).toBe('equal:10');
    expect(scale.names[0]).toBe('540–530 Ma');
    expect(scale.names).toHaveLength(54);
    expect(parseBinsOption('equal:2.5', 10).names).toEqual(['10–7.5 Ma', '7.5–5 Ma', '5–2.5 Ma', '2.5–0 Ma']);
  });

  it.each([
    ['eons', 'bins "eons": expected periods, epochs, stages, equal:N (N-Myr bins, e.g. equal:10) or a bin table file'],
    ['equal:', 'equal "": expected a bin width in Myr greater than 0, as in equal:10'],
    ['equal:ten', 'equal "ten": expected a bin width in Myr greater than 0, as in equal:10'],
    ['equal:-5', 'equal "-5": expected a bin width in Myr greater than 0, as in equal:10'],
    ['equal:0', 'equal "0": expected a bin width in Myr greater than 0'],
  ])('refuses "%s" with a clear message', (text, message) => {
    expect(() => parseBinsOption(text)).toThrow(message);
  });
});

describe('the rule option', () => {
  it('reads every rule, ignoring case and surrounding whitespace', () => {
    expect(parseAssignRule('mid-age', 0)).toEqual({ kind: 'mid-age' });
    expect(parseAssignRule(' Whole-Range ', 0)).toEqual({ kind: 'whole-range' });
    expect(parseAssignRule('share:0.5', 0)).toEqual({ kind: 'share', fraction: 0.5 });
    expect(parseAssignRule('share:1', 0)).toEqual({ kind: 'share', fraction: 1 });
    expect(parseAssignRule('draw', 42)).toEqual({ kind: 'draw', seed: 42 });
  });

  it.each([
    ['share:0', 0, 'share "0": expected a share of the age range greater than 0 and at most 1, as in share:0.5'],
    ['share:1.5', 0, 'share "1.5": expected a share'],
    ['share:half', 0, 'share "half": expected a share'],
    ['draw', -3, 'seed "-3": expected an integer from 0 to 4294967295'],
    ['draw', 2.5, 'seed "2.5": expected an integer from 0 to 4294967295'],
    ['nearest', 0, 'rule "nearest": expected mid-age, whole-range, share:F (0 < F <= 1) or draw'],
    ['midpoint', 0, 'rule "midpoint": expected mid-age, whole-range, share:F (0 < F <= 1) or draw'],
  ])('refuses "%s" (seed %d) with a clear message', (text, seed, message) => {
    expect(() => parseAssignRule(text, seed)).toThrow(message);
  });
});
