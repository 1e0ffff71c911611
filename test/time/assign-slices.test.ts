import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  assignSlices,
  assignSlicesInto,
  chartScale,
  createSeededRandom,
  createSliceAssignment,
  type AssignRule,
  type TimeScale,
} from '../../src/time';
import { EXCLUSIONS, EXCLUSION_CODE, EXCLUSION_STAGE, NOT_EXCLUDED } from '../../src/problems';

// Boundary convention (docs DESIGN, "The export contract"): a slice covers top < age <= base, an age
// on a boundary belongs to the younger unit, whose base it is (a boundary stratotype marks a base),
// and an age of 0 belongs to the youngest slice. The examples below are worked by hand.

function scale(bins: ReadonlyArray<readonly [string, number, number]>): TimeScale {
  return {
    label: 'test',
    names: bins.map((b) => b[0]),
    baseMa: Float64Array.from(bins, (b) => b[1]),
    topMa: Float64Array.from(bins, (b) => b[2]),
  };
}

// A (30, 20], B (20, 10], C (10, 0]
const ABC = scale([['A', 30, 20], ['B', 20, 10], ['C', 10, 0]]);
// A (30, 20], gap 20..15, B (15, 5]: nothing reaches 0
const GAPPED = scale([['A', 30, 20], ['B', 15, 5]]);

const REASON = { outside: EXCLUSION_CODE.ageOutside, spans: EXCLUSION_CODE.spansSlices, share: EXCLUSION_CODE.shareTooSmall } as const;

function run(rule: AssignRule, ranges: ReadonlyArray<readonly [number, number]>, on: TimeScale = ABC) {
  const out = assignSlices(Float64Array.from(ranges, (r) => r[0]), Float64Array.from(ranges, (r) => r[1]), on, rule);
  return { slice: Array.from(out.slice), reason: Array.from(out.reason), age: Array.from(out.age) };
}

describe('the reason codes', () => {
  it('are slice-stage exclusions about the age, distinct from each other and from NOT_EXCLUDED', () => {
    for (const name of ['ageOutside', 'spansSlices', 'shareTooSmall'] as const) {
      expect(EXCLUSIONS[name]).toMatchObject({ stage: EXCLUSION_STAGE.slice, field: 'age' });
    }
    expect(new Set([NOT_EXCLUDED, REASON.outside, REASON.spans, REASON.share]).size).toBe(4);
  });
});

describe('boundary semantics', () => {
  it('gives an age exactly on a boundary to the younger slice', () => {
    expect(run({ kind: 'mid-age' }, [[20, 20], [10, 10], [30, 30]]).slice).toEqual([1, 2, 0]);
  });

  it('gives age 0 to the youngest slice when its top is 0, and to none otherwise', () => {
    expect(run({ kind: 'mid-age' }, [[0, 0]]).slice).toEqual([2]);
    expect(run({ kind: 'mid-age' }, [[0, 0]], GAPPED)).toMatchObject({ slice: [-1], reason: [REASON.outside] });
  });

  it('gives no slice to ages older than the scale or inside a gap', () => {
    expect(run({ kind: 'mid-age' }, [[30.5, 30.5], [17, 17], [20, 20]], GAPPED)).toMatchObject({
      slice: [-1, -1, -1],
      reason: [REASON.outside, REASON.outside, REASON.outside],
    });
  });

  it('puts the base of the Paleogene (66.0 Ma) in the Danian and 0 Ma in the Meghalayan on the chart', () => {
    const stages = chartScale('stages');
    const out = assignSlices(Float64Array.of(66.0, 0), Float64Array.of(66.0, 0), stages, { kind: 'mid-age' });
    expect(stages.names[out.slice[0]]).toBe('Danian');
    expect(stages.names[out.slice[1]]).toBe('Meghalayan');
  });
});

describe('the mid-age rule', () => {
  it('uses the slice holding the mid-age and records the mid-age as the age', () => {
    // [12, 24] → 18 in B; [20, 40] → 30 on A's base; [28, 36] → 32, older than the scale
    expect(run({ kind: 'mid-age' }, [[24, 12], [40, 20], [36, 28]])).toEqual({
      slice: [1, 0, -1],
      reason: [NOT_EXCLUDED, NOT_EXCLUDED, REASON.outside],
      age: [18, 30, Number.NaN],
    });
  });

  it('assigns a slice whose (top, base] holds the mid-age, for any range on the chart stages', () => {
    const stages = chartScale('stages');
    fc.assert(
      fc.property(fc.double({ min: 0, max: 560, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (max, width) => {
        const min = Math.max(0, max - width);
        const out = assignSlices(Float64Array.of(max), Float64Array.of(min), stages, { kind: 'mid-age' });
        const mid = 0.5 * (max + min);
        const s = out.slice[0];
        if (s < 0) return mid > stages.baseMa[0];
        return (mid > stages.topMa[s] || (mid === 0 && s === stages.names.length - 1)) && mid <= stages.baseMa[s];
      }),
    );
  });
});

describe('the whole-range rule', () => {
  it('assigns a range lying inside one slice, a range equal to a slice included', () => {
    // [12, 18] inside B; [10, 20] is exactly B (closed containment for ranges); [0, 10] exactly C
    expect(run({ kind: 'whole-range' }, [[18, 12], [20, 10], [10, 0]])).toMatchObject({ slice: [1, 1, 2], age: [15, 15, 5] });
  });

  it('treats a range of zero length as a point age', () => {
    expect(run({ kind: 'whole-range' }, [[20, 20], [0, 0]]).slice).toEqual([1, 2]);
  });

  it('rejects a range across a boundary as spanning, and one reaching past the scale as outside', () => {
    // [15, 25] crosses 20; [25, 35] runs past A's base at 30; [31, 40] lies wholly beyond it
    expect(run({ kind: 'whole-range' }, [[25, 15], [35, 25], [40, 31]]).reason).toEqual([REASON.spans, REASON.outside, REASON.outside]);
  });

  it('rejects a range reaching into a gap as outside the scale', () => {
    // [18, 22] runs from A into the gap below 20; [16, 19] lies in the gap
    expect(run({ kind: 'whole-range' }, [[22, 18], [19, 16]], GAPPED).reason).toEqual([REASON.outside, REASON.outside]);
  });
});

describe('the share rule', () => {
  it('assigns the slice with the largest share when the share reaches F', () => {
    // [12, 26]: B holds 8 of 14 Myr (0.571), A holds 6
    expect(run({ kind: 'share', fraction: 0.5 }, [[26, 12]]).slice).toEqual([1]);
    expect(run({ kind: 'share', fraction: 0.6 }, [[26, 12]])).toMatchObject({ slice: [-1], reason: [REASON.share] });
  });

  it('gives an even split to the younger slice, as the mid-age rule would', () => {
    // [15, 25]: A and B hold 5 Myr each; the mid-age, 20, belongs to B
    expect(run({ kind: 'share', fraction: 0.5 }, [[25, 15]]).slice).toEqual([1]);
    expect(run({ kind: 'mid-age' }, [[25, 15]]).slice).toEqual([1]);
  });

  it('counts parts of the range outside the scale in the share', () => {
    // [25, 40]: A holds 5 of 15 Myr
    expect(run({ kind: 'share', fraction: 0.3 }, [[40, 25]]).slice).toEqual([0]);
    expect(run({ kind: 'share', fraction: 0.5 }, [[40, 25]]).reason).toEqual([REASON.share]);
    expect(run({ kind: 'share', fraction: 0.1 }, [[40, 31]]).reason).toEqual([REASON.outside]);
  });

  it('gives a point age share 1 of the slice holding it', () => {
    expect(run({ kind: 'share', fraction: 1 }, [[20, 20], [0, 0]]).slice).toEqual([1, 2]);
  });

  it('picks the middle slice of a range over three slices', () => {
    // [5, 25]: A 5, B 10, C 5 of 20 Myr
    expect(run({ kind: 'share', fraction: 0.5 }, [[25, 5]]).slice).toEqual([1]);
  });
});

describe('the draw rule', () => {
  const ranges: ReadonlyArray<readonly [number, number]> = [[25, 5], [20, 20], [30, 0], [12, 11]];

  it('is reproducible for a seed and differs between seeds', () => {
    expect(run({ kind: 'draw', seed: 7 }, ranges)).toEqual(run({ kind: 'draw', seed: 7 }, ranges));
    expect(run({ kind: 'draw', seed: 7 }, ranges).age).not.toEqual(run({ kind: 'draw', seed: 8 }, ranges).age);
  });

  it('draws once per row in row order, point ages included', () => {
    const random = createSeededRandom(7);
    const expected = ranges.map(([max, min]) => min + random.nextUniform() * (max - min));
    expect(run({ kind: 'draw', seed: 7 }, ranges).age).toEqual(expected);
  });

  it('draws inside the range and assigns the slice holding the draw', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 30, noNaN: true }), fc.double({ min: 0, max: 30, noNaN: true }), fc.nat(), (a, b, seed) => {
        const [max, min] = a >= b ? [a, b] : [b, a];
        const { slice, age } = run({ kind: 'draw', seed }, [[max, min]]);
        if (!(age[0] >= min && age[0] <= max)) return false;
        return slice[0] === run({ kind: 'mid-age' }, [[age[0], age[0]]]).slice[0];
      }),
    );
  });
});

// A straightforward reference: look at every slice for every row.
function referenceSlice(on: TimeScale, age: number): number {
  const last = on.names.length - 1;
  for (let i = 0; i <= last; i++) {
    if ((age > on.topMa[i] && age <= on.baseMa[i]) || (age === 0 && i === last && on.topMa[i] === 0)) return i;
  }
  return -1;
}

describe('the binary-search lookup', () => {
  it('agrees with a linear scan over the chart stages and over a scale with gaps', () => {
    const stages = chartScale('stages');
    const boundaries = [...stages.baseMa, 0, 30, 20, 15, 5];
    fc.assert(
      fc.property(fc.oneof(fc.double({ min: -1, max: 600, noNaN: true }), fc.constantFrom(...boundaries)), (age) => {
        for (const on of [stages, GAPPED]) {
          const got = assignSlices(Float64Array.of(age), Float64Array.of(age), on, { kind: 'mid-age' }).slice[0];
          if (got !== referenceSlice(on, age)) return false;
        }
        return true;
      }),
    );
  });

  it('writes into given columns and checks their lengths', () => {
    const out = createSliceAssignment(2);
    assignSlicesInto(Float64Array.of(18, 5), Float64Array.of(12, 5), ABC, { kind: 'mid-age' }, out);
    expect(Array.from(out.slice)).toEqual([1, 2]);
    expect(() => assignSlicesInto(Float64Array.of(1), Float64Array.of(1), ABC, { kind: 'mid-age' }, out)).toThrow(/lengths differ/);
  });
});
