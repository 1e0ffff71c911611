import { describe, expect, it } from 'vitest';
import { EXCLUSIONS, EXCLUSION_CODE, EXCLUSION_NAMES, NOT_EXCLUDED, exclusionName } from '../../src/problems';

describe('exclusion codes', () => {
  it('give each reason its own code, none of them NOT_EXCLUDED, and fit a Uint8Array', () => {
    const codes = EXCLUSION_NAMES.map((name) => EXCLUSION_CODE[name]);
    expect(new Set([NOT_EXCLUDED, ...codes]).size).toBe(EXCLUSION_NAMES.length + 1);
    expect(Array.from(Uint8Array.from(codes))).toEqual(codes);
  });

  it('lead back to the reason they were given for', () => {
    for (const name of EXCLUSION_NAMES) expect(exclusionName(EXCLUSION_CODE[name])).toBe(name);
    expect(EXCLUSION_NAMES).toEqual(Object.keys(EXCLUSIONS));
  });

  it('refuse NOT_EXCLUDED and codes that stand for nothing, naming the code', () => {
    expect(() => exclusionName(NOT_EXCLUDED)).toThrow(new RangeError(`Exclusion code 0 stands for no reason; codes run from 1 to ${EXCLUSION_NAMES.length}.`));
    expect(() => exclusionName(EXCLUSION_NAMES.length + 1)).toThrow(RangeError);
  });
});
