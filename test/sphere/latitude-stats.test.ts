import { describe, expect, it } from 'vitest';
import { latitudeStats } from '../../src/sphere/latitude-stats';

describe('latitude statistics', () => {
  // Worked by hand: latitudes −10, 35, 5 → southernmost −10, northernmost 35, span 45.
  it('gives the southernmost and northernmost latitude and the span between them', () => {
    expect(latitudeStats(Float64Array.of(-10, 35, 5))).toEqual({ minDeg: -10, maxDeg: 35, spanDeg: 45 });
  });

  it('gives a span of 0 for one position and the whole 180° from pole to pole', () => {
    expect(latitudeStats(Float64Array.of(12.5))).toEqual({ minDeg: 12.5, maxDeg: 12.5, spanDeg: 0 });
    expect(latitudeStats(Float64Array.of(90, 0, -90)).spanDeg).toBe(180);
  });

  it('gives NaN for no positions', () => {
    const s = latitudeStats(new Float64Array(0));
    expect(s.minDeg).toBeNaN();
    expect(s.maxDeg).toBeNaN();
    expect(s.spanDeg).toBeNaN();
  });
});
