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
    expect(parseAssignRule('midpoint', 0)).toEqual({ kind: 'midpoint' });
    expect(parseAssignRule(' Within ', 0)).toEqual({ kind: 'within' });
    expect(parseAssignRule('overlap:0.5', 0)).toEqual({ kind: 'overlap', fraction: 0.5 });
    expect(parseAssignRule('overlap:1', 0)).toEqual({ kind: 'overlap', fraction: 1 });
    expect(parseAssignRule('random', 42)).toEqual({ kind: 'random', seed: 42 });
  });

  it.each([
    ['overlap:0', 0, 'overlap "0": expected a share of the age range greater than 0 and at most 1, as in overlap:0.5'],
    ['overlap:1.5', 0, 'overlap "1.5": expected a share'],
    ['overlap:half', 0, 'overlap "half": expected a share'],
    ['random', -3, 'seed "-3": expected an integer from 0 to 4294967295'],
    ['random', 2.5, 'seed "2.5": expected an integer from 0 to 4294967295'],
    ['nearest', 0, 'rule "nearest": expected midpoint, within, overlap:F (0 < F <= 1) or random'],
  ])('refuses "%s" (seed %d) with a clear message', (text, seed, message) => {
    expect(() => parseAssignRule(text, seed)).toThrow(message);
  });
});
