import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ticks as d3Ticks } from 'd3-array';
import { niceAxis, niceTicks, niceTickStep } from '../../web/charts/ticks';

describe('niceTicks', () => {
  // Hand-worked: the raw step (stop − start) / count has leading digit m; m ≥ √50 → 10,
  // m ≥ √10 → 5, m ≥ √2 → 2, else 1 (nearest of 1, 2, 5, 10 on a log scale).
  it('steps by 2 from 0 to 10 asked for 5 ticks (raw step 2)', () => {
    expect(niceTicks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
  });

  it('steps by 10 over 252–299 Ma asked for 5 ticks (raw step 9.4 rounds up to 10)', () => {
    expect(niceTicks(252, 299, 5)).toEqual([260, 270, 280, 290]);
  });

  it('steps by 5000 from 0 to 12345 asked for 3 ticks (raw step 4115, m = 4.1 ≥ √10)', () => {
    expect(niceTicks(0, 12345, 3)).toEqual([0, 5000, 10000]);
  });

  it('writes decimal steps exactly (0.2, not 0.6000000000000001)', () => {
    expect(niceTicks(0, 1, 4)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(0.3, 0.7, 4)).toEqual([0.3, 0.4, 0.5, 0.6, 0.7]);
  });

  it('runs backwards when start is above stop', () => {
    expect(niceTicks(10, 0, 5)).toEqual([10, 8, 6, 4, 2, 0]);
  });

  it('gives the single value of an empty range and nothing for a bad count', () => {
    expect(niceTicks(3, 3, 5)).toEqual([3]);
    expect(niceTicks(0, 1, 0)).toEqual([]);
    expect(niceTicks(0, NaN, 5)).toEqual([]);
  });

  // Reference: d3-array 3.2 `ticks`, a general-purpose library (installed with d3-geo).
  it('matches d3-array ticks on random ranges and counts', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e6, noNaN: true }),
        fc.integer({ min: 2, max: 20 }),
        (start, width, count) => {
          const stop = start + width;
          expect(niceTicks(start, stop, count)).toEqual(d3Ticks(start, stop, count));
          expect(niceTicks(stop, start, count)).toEqual(d3Ticks(stop, start, count));
        },
      ),
      { numRuns: 2000, seed: 42 },
    );
  });

  it('matches d3-array ticks on geological ranges with a tick every ~80 px', () => {
    for (const [young, old] of [[0, 538.8], [66, 298.9], [251.902, 252.17], [0, 0.0117], [2.58, 23.03]]) {
      for (const count of [3, 6, 9, 14]) expect(niceTicks(young, old, count)).toEqual(d3Ticks(young, old, count));
    }
  });
});

describe('niceTickStep', () => {
  it('is the spacing of niceTicks', () => {
    expect(niceTickStep(0, 12345, 3)).toBe(5000);
    expect(niceTickStep(0, 1, 4)).toBe(0.2);
    expect(niceTickStep(299, 66, 6)).toBe(50);
  });
});

describe('niceAxis', () => {
  it('rounds a maximum up to the next nice tick: 12345 → 15000, 5 → 6, 0.93 → 1, 0.75 → 0.8', () => {
    // 12345 / 3 → step 5000; 5 / 3 = 1.67 → step 2; 0.93 / 2 = 0.465 → step 0.5; 0.75 / 4 = 0.1875 → step 0.2.
    expect(niceAxis(12345, 3).top).toBe(15000);
    expect(niceAxis(5, 3).top).toBe(6);
    expect(niceAxis(0.93, 2).top).toBe(1);
    expect(niceAxis(0.75, 4).top).toBe(0.8);
  });

  it('keeps a maximum that already is a tick', () => {
    expect(niceAxis(6000, 3).top).toBe(6000);
    expect(niceAxis(1, 4).top).toBe(1);
  });

  it('gives 1 when there is nothing to show', () => {
    expect(niceAxis(0, 3).top).toBe(1);
    expect(niceAxis(NaN, 3).top).toBe(1);
  });

  it('ends the axis on a labelled tick: 800000.0000000001 over 6 ticks gives 0 … 900000 by 100000', () => {
    // The step comes from [0, max] (raw 133333 → 100000); taking ticks of [0, 900000] afresh would
    // step by 200000 and leave 900000 unlabelled.
    const axis = niceAxis(800000.0000000001, 6);
    expect(axis.top).toBe(900000);
    expect(axis.step).toBe(100000);
    expect(axis.ticks).toEqual([0, 100000, 200000, 300000, 400000, 500000, 600000, 700000, 800000, 900000]);
  });

  it('is never below the maximum, starts at 0 and ends on its top, with the step of niceTicks over [0, max] (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e9, noNaN: true }), fc.integer({ min: 1, max: 10 }), (max, count) => {
        const axis = niceAxis(max, count);
        expect(axis.top).toBeGreaterThanOrEqual(max);
        expect(axis.ticks[0]).toBe(0);
        expect(axis.ticks.at(-1)).toBe(axis.top);
        expect(axis.step).toBe(niceTickStep(0, max, count));
        // No more than one step past max.
        expect(axis.top - max).toBeLessThan(axis.step * (1 + 1e-9));
      }),
      { seed: 7 },
    );
  });
});
