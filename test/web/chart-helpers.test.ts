import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { linearScale } from '../../web/charts/linear-scale';
import { formatLatitude, formatNumber, formatPercent, tickFormat } from '../../web/charts/number-format';
import { linePath, markerPath } from '../../web/charts/line-path';
import { finiteMax, normalised, seriesAxisLabel, SERIES, visibleSeries } from '../../web/charts/series';
import { wrapPieces } from '../../web/charts/marks';
import { memoLast } from '../../web/charts/memo-last';

describe('linearScale', () => {
  it('maps 300 Ma to the left edge and 0 Ma to the right edge of 50…650 px, 150 Ma to the middle', () => {
    const x = linearScale([300, 0], [50, 650]);
    expect(x(300)).toBe(50);
    expect(x(0)).toBe(650);
    expect(x(150)).toBe(350);
    expect(x.invert(350)).toBe(150);
  });

  it('inverts its forward map (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), (d0, width, v) => {
        const scale = linearScale([d0, d0 + width], [800, 20]);
        expect(scale.invert(scale(v))).toBeCloseTo(v, 6);
      }),
      { seed: 3 },
    );
  });

  it('puts everything in the middle of the range when the domain has no width', () => {
    expect(linearScale([5, 5], [0, 100])(7)).toBe(50);
  });
});

describe('number formats', () => {
  it('labels ticks in thousands or millions once the largest tick reaches 10 000 or 1 000 000', () => {
    expect([0, 5000, 10000, 15000].map(tickFormat(5000, 15000))).toEqual(['0', '5k', '10k', '15k']);
    expect([200000, 1200000].map(tickFormat(200000, 1200000))).toEqual(['0.2M', '1.2M']);
    expect([0, 2000, 4000, 6000].map(tickFormat(2000, 6000))).toEqual(['0', '2000', '4000', '6000']);
  });

  it('gives tick labels the decimals their step needs', () => {
    expect([0, 0.2, 0.4, 1].map(tickFormat(0.2, 1))).toEqual(['0', '0.2', '0.4', '1.0']);
    expect([50, 250].map(tickFormat(50, 300))).toEqual(['50', '250']);
    expect([0.05, 0.1].map(tickFormat(0.05, 0.1))).toEqual(['0.05', '0.10']);
  });

  it('groups thousands with commas and shows a missing value as a dash', () => {
    expect(formatNumber(1234567.891)).toBe('1,234,568');
    expect(formatNumber(999)).toBe('999');
    expect(formatNumber(66.64, 1)).toBe('66.6');
    expect(formatNumber(-1234.5, 1)).toBe('−1,234.5');
    expect(formatNumber(-0.04, 1)).toBe('0.0');
    expect(formatNumber(NaN)).toBe('—');
  });

  it('writes shares as percentages with one decimal', () => {
    expect(formatPercent(0.1234)).toBe('12.3%');
    expect(formatPercent(1)).toBe('100.0%');
  });

  it('writes latitudes with their hemisphere', () => {
    expect(formatLatitude(30)).toBe('30°N');
    expect(formatLatitude(-30)).toBe('30°S');
    expect(formatLatitude(0)).toBe('0°');
    expect(formatLatitude(-7.5)).toBe('7.5°S');
  });
});

describe('linePath', () => {
  it('breaks the line at a NaN instead of dropping to zero', () => {
    expect(linePath([0, 10, 20, 30, 40], [5, 6, NaN, 7, 8])).toBe('M0,5L10,6M30,7L40,8');
  });

  it('draws no segment for a point with no neighbours (markerPath shows those)', () => {
    expect(linePath([0, 10, 20, 30], [1, NaN, 3, NaN])).toBe('');
    expect(linePath([0, 10, 20], [NaN, 2, 4])).toBe('M10,2L20,4');
  });

  it('keeps zero as a value', () => {
    expect(linePath([0, 10, 20], [0, 0, 0])).toBe('M0,0L10,0L20,0');
  });

  it('rounds coordinates to 0.1 px', () => {
    expect(linePath([0.04, 10.25], [1.16, 2])).toBe('M0,1.2L10.3,2');
  });

  it('has one subpath per run of two or more finite values (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constant(NaN), fc.double({ min: 0, max: 100, noNaN: true })), { maxLength: 40 }), (ys) => {
        const xs = ys.map((_, i) => i * 10);
        let runs = 0;
        let length = 0;
        for (const y of [...ys, NaN]) {
          if (Number.isNaN(y)) {
            if (length >= 2) runs++;
            length = 0;
          } else length++;
        }
        expect((linePath(xs, ys).match(/M/g) ?? []).length).toBe(runs);
      }),
      { seed: 11 },
    );
  });
});

describe('markerPath', () => {
  it('draws a dot of radius 2 at (10, 5) as two half-circle arcs', () => {
    expect(markerPath([10], [5], 2, true)).toBe('M8,5a2,2 0 1,0 4,0a2,2 0 1,0 -4,0');
  });

  it('marks only isolated points unless asked for all', () => {
    const xs = [0, 10, 20, 30, 40];
    const ys = [1, 2, NaN, 3, NaN];
    expect((markerPath(xs, ys, 1, false).match(/M/g) ?? []).length).toBe(1);
    expect(markerPath(xs, ys, 1, false)).toBe('M29,3a1,1 0 1,0 2,0a1,1 0 1,0 -2,0');
    expect((markerPath(xs, ys, 1, true).match(/M/g) ?? []).length).toBe(3);
  });
});

describe('series', () => {
  it('divides each value by the largest finite one and keeps NaN as a gap', () => {
    expect(Array.from(normalised([2, NaN, 4, 1]))).toEqual([0.5, NaN, 1, 0.25]);
  });

  it('leaves a series of zeros at zero rather than dividing by zero', () => {
    expect(Array.from(normalised([0, 0, NaN]))).toEqual([0, 0, NaN]);
  });

  it('finds the largest finite value, 0 for none', () => {
    expect(finiteMax([3, NaN, 7, Infinity])).toBe(7);
    expect(finiteMax([NaN])).toBe(0);
  });

  it('returns visible series in table order and ignores unknown names', () => {
    expect(visibleSeries(['latSpan', 'bogus', 'occurrences']).map((s) => s.key)).toEqual(['occurrences', 'latSpan']);
  });

  it('calls collections "distinct places" when the table names no collections, and gives units on axes', () => {
    const collections = SERIES.find((s) => s.key === 'collections')!;
    const hull = SERIES.find((s) => s.key === 'hullKm2')!;
    expect(seriesAxisLabel(collections, true)).toBe('distinct places');
    expect(seriesAxisLabel(collections, false)).toBe('collections');
    expect(seriesAxisLabel(hull, false)).toBe('hull area (km²)');
  });

  it('gives every series its own colour', () => {
    expect(new Set(SERIES.map((s) => s.colour.join(','))).size).toBe(SERIES.length);
  });
});

describe('wrapPieces', () => {
  it('starts a new line when the next piece would pass the width (0.6 em per glyph)', () => {
    // At 10 px a glyph is 6 px: "aaaa · bbbb" is 11 glyphs = 66 px, over 60.
    expect(wrapPieces(['aaaa', 'bbbb', 'cc'], ' · ', 10, 60)).toEqual(['aaaa', 'bbbb · cc']);
    expect(wrapPieces(['aaaa', 'bbbb'], ' · ', 10, 66)).toEqual(['aaaa · bbbb']);
  });

  it('never splits a piece, even one wider than the line', () => {
    expect(wrapPieces(['a very long piece'], ' · ', 10, 10)).toEqual(['a very long piece']);
  });
});

describe('memoLast', () => {
  it('computes again only when an argument changes', () => {
    let calls = 0;
    const f = memoLast((a: object, n: number) => {
      calls++;
      return { a, n };
    });
    const key = {};
    const first = f(key, 1);
    expect(f(key, 1)).toBe(first);
    expect(calls).toBe(1);
    expect(f({}, 1)).not.toBe(first);
    f({}, 2);
    expect(calls).toBe(3);
  });
});
