import { describe, expect, it } from 'vitest';
import { logChanges, movedNames, samplingShift, footprintCorrelations, DEFAULT_SHIFT_THRESHOLD } from '../../src/richness';

const series = (...v: number[]) => Float64Array.from(v);

describe('the sampling-shift flag', () => {
  // Raw richness 10 → 20 → 21 → 10; footprint and standardised series chosen per case.
  const raw = series(10, 20, 21, 10);
  const footprint = [
    { name: 'cells', values: series(5, 15, 15, 5) },
    { name: 'lat_span', values: series(30, 31, 0, 20) },
    { name: 'collections', values: series(8, 30, 31, 8) },
  ];

  it('flags a raw change that moves with the footprint while the standardised series stays, and names the measures', () => {
    // Slice 1: raw ×2 (ln 2 ≥ ln 1.25); cells ×3 and collections ×3.75 move with it, lat_span
    // ×1.03 does not; SQS ×1.05 does not → flagged, moved = cells;collections.
    // Slice 2: raw ×1.05 is below the threshold → not flagged.
    // Slice 3: raw ×0.48, cells ×0.33 with it; lat_span has no change (0 before); SQS ×0.5 moves
    // with it → not flagged.
    const sqs = logChanges(series(6, 6.3, 6.3, 3.15));
    const flag = samplingShift(raw, footprint, [{ name: 'sqs_mean', values: sqs }]);
    expect(Array.from(flag.state)).toEqual([2, 1, 0, 0]);
    expect(movedNames(flag.moved[1], footprint)).toBe('cells;collections');
    expect(flag.moved[3]).toBe(0);
  });

  it('is not assessable without any standardised change, and uses ln 1.25 by default', () => {
    const none = logChanges(series(Number.NaN, Number.NaN, 3, Number.NaN));
    expect(Array.from(samplingShift(raw, footprint, [{ name: 'sqs_mean', values: none }]).state)).toEqual([2, 2, 2, 2]);
    expect(DEFAULT_SHIFT_THRESHOLD).toBeCloseTo(Math.log(1.25), 15);
  });

  it('correlates first differences of richness with each footprint measure', () => {
    // Differences of raw: 10, 1, −11; of cells: 10, 0, −10. Pearson by hand: means 0 and 0,
    // Sxy = 100 + 0 + 110 = 210, Sxx = 100 + 1 + 121 = 222, Syy = 200 → r = 210/√(222·200).
    const [cells] = footprintCorrelations(raw, footprint);
    expect(cells.pairs).toBe(3);
    expect(cells.pearson).toBeCloseTo(210 / Math.sqrt(222 * 200), 14);
    expect(cells.spearman).toBeCloseTo(1, 14); // same order of the three differences
  });
});
