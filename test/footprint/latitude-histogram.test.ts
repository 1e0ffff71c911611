import { describe, expect, it } from 'vitest';
import { latitudeHistogram } from '../../src/footprint/latitude-histogram';

describe('latitudeHistogram', () => {
  it('counts rows per slice and 30-degree band, counted by hand', () => {
    const slice = Int32Array.from([0, 0, 1, 1, -1, 0]);
    const lat = Float64Array.from([-90, -60.5, 0, 89.9, 10, 90]);
    const h = latitudeHistogram(slice, lat, 2, 30);
    expect(h.bands).toBe(6);
    // Slice 0: −90 → band 0, −60.5 → band 0, 90 (the pole) → band 5. Slice 1: 0 → band 3, 89.9 → band 5.
    expect(Array.from(h.perSlice)).toEqual([2, 0, 0, 0, 0, 1, 0, 0, 0, 1, 0, 1]);
    expect(Array.from(h.total)).toEqual([2, 0, 0, 1, 0, 2]); // the unplaced row (slice −1) is not counted
  });

  it('keeps groups apart when a second key is given', () => {
    const h = latitudeHistogram(Int32Array.from([0, 0, 0]), Float64Array.from([5, 5, -5]), 1, 90, { of: [0, 1, 1], count: 2 });
    expect(Array.from(h.perSlice)).toEqual([0, 1, 1, 1]);
  });

  it('refuses a band width that does not divide 180 degrees', () => {
    expect(() => latitudeHistogram(new Int32Array(0), new Float64Array(0), 1, 7)).toThrow(/divide 180/);
  });
});
