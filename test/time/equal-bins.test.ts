import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_EQUAL_BINS, equalBins } from '../../src/time';
import { InputError } from '../../src/problems';

// Equal bins are plain arithmetic (boundaries at k × width, anchored at 0 Ma, common practice);
// the checks below are worked by hand and by invariant.

describe('equal bins', () => {
  it('anchors boundaries at multiples of the width and names them oldest first', () => {
    const scale = equalBins(10, 25);
    expect(scale.label).toBe('equal:10');
    expect(scale.names).toEqual(['30–20 Ma', '20–10 Ma', '10–0 Ma']);
    expect(Array.from(scale.baseMa)).toEqual([30, 20, 10]);
    expect(Array.from(scale.topMa)).toEqual([20, 10, 0]);
  });

  it('covers a range that does not start at 0 with whole bins only', () => {
    expect(equalBins(10, 125, 35).names).toEqual(['130–120 Ma', '120–110 Ma', '110–100 Ma', '100–90 Ma', '90–80 Ma', '80–70 Ma', '70–60 Ma', '60–50 Ma', '50–40 Ma', '40–30 Ma']);
    expect(equalBins(10, 120, 110).names).toEqual(['120–110 Ma']);
  });

  it('writes decimal boundaries without binary noise', () => {
    const scale = equalBins(0.1, 0.3);
    expect(scale.names).toEqual(['0.3–0.2 Ma', '0.2–0.1 Ma', '0.1–0 Ma']);
    expect(scale.baseMa[0]).toBe(0.3);
  });

  it('tiles its extent with equal, contiguous bins on multiples of the width', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 50 }), fc.integer({ min: 0, max: 500 }), fc.integer({ min: 1, max: 1000 }), (width, youngest, span) => {
        const oldest = youngest + span;
        const s = equalBins(width, oldest, youngest);
        const n = s.names.length;
        if (!(s.baseMa[0] >= oldest && s.topMa[n - 1] <= youngest)) return false;
        if (s.baseMa[0] - width >= oldest || s.topMa[n - 1] + width <= youngest) return false;
        for (let i = 0; i < n; i++) {
          if (s.baseMa[i] - s.topMa[i] !== width || s.baseMa[i] % width !== 0) return false;
          if (i > 0 && s.baseMa[i] !== s.topMa[i - 1]) return false;
        }
        return true;
      }),
    );
  });

  it.each([
    [0, 100, 0, 'equal "0": expected a bin width in Myr greater than 0'],
    [-5, 100, 0, 'equal "-5": expected a bin width in Myr greater than 0'],
    [Number.NaN, 100, 0, 'equal "NaN": expected a bin width in Myr greater than 0'],
    [10, 50, 50, 'oldest age "50": expected an age in Ma older than the youngest age (50)'],
    [10, 50, -1, 'youngest age "-1": expected an age in Ma of 0 or more'],
  ])('refuses width %f over %f–%f Ma with a message naming the value', (width, oldest, youngest, message) => {
    expect(() => equalBins(width, oldest, youngest)).toThrow(message);
  });

  it('refuses a width that would make more than MAX_EQUAL_BINS bins', () => {
    expect(() => equalBins(0.001, 541)).toThrow(InputError);
    expect(() => equalBins(0.001, 541)).toThrow(`at most ${MAX_EQUAL_BINS} bins`);
  });
});
