import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { positionCodes } from '../../src/footprint/position-codes';
import { ABSENT_CODE } from '../../src/table/occurrence-table';

describe('positionCodes', () => {
  it('numbers distinct positions in first-seen order', () => {
    const { codes, count } = positionCodes(Float64Array.from([10, 20, 10, 10]), Float64Array.from([5, 5, 5, 6]));
    expect(Array.from(codes)).toEqual([0, 1, 0, 2]);
    expect(count).toBe(3);
  });

  it('treats longitude -180 as 180, any longitude at a pole as one place, and -0 as 0', () => {
    // Same points on the sphere, written differently (common practice in spherical geometry).
    const lat = Float64Array.from([12, 12, 90, 90, -90, -90, 0, -0]);
    const lon = Float64Array.from([-180, 180, 15, -70, 0, 33, -0, 0]);
    expect(Array.from(positionCodes(lat, lon).codes)).toEqual([0, 0, 1, 1, 2, 2, 3, 3]);
  });

  it('gives rows without a position the absent code', () => {
    const { codes, count } = positionCodes(Float64Array.from([NaN, 1]), Float64Array.from([0, NaN]));
    expect(Array.from(codes)).toEqual([ABSENT_CODE, ABSENT_CODE]);
    expect(count).toBe(0);
  });

  it('agrees with string keys on random positions drawn from a small set (property)', () => {
    const coordinate = fc.constantFrom(-90, -45.5, 0, 1e-9, 45.5, 90);
    const longitude = fc.constantFrom(-180, -1.25, 0, 1.25, 179.999, 180);
    fc.assert(
      fc.property(fc.array(fc.tuple(coordinate, longitude), { maxLength: 300 }), (points) => {
        const lat = Float64Array.from(points.map((p) => p[0]));
        const lon = Float64Array.from(points.map((p) => p[1]));
        const key = ([la, lo]: [number, number]) => (Math.abs(la) === 90 ? `${la}` : `${la + 0},${lo === -180 ? 180 : lo}`);
        const ids = new Map<string, number>();
        const expected = points.map((p) => {
          const k = key(p);
          if (!ids.has(k)) ids.set(k, ids.size);
          return ids.get(k);
        });
        const result = positionCodes(lat, lon);
        expect(Array.from(result.codes)).toEqual(expected);
        expect(result.count).toBe(ids.size);
      }),
    );
  });
});
