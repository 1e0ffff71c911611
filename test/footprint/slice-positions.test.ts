import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { slicePositions } from '../../src/footprint/slice-positions';

describe('slicePositions', () => {
  it('numbers places within each slice in first-seen order and lists each once', () => {
    // Slice 0: rows 0–3; slice 1: rows 4–5 (the place of row 4 also occurs in slice 0).
    const lat = Float64Array.from([10, 20, 10, 10, 10, 30]);
    const lon = Float64Array.from([5, 5, 5, 6, 5, 1]);
    const places = slicePositions(lat, lon, Uint32Array.from([0, 4, 6]));
    expect(Array.from(places.codes)).toEqual([0, 1, 0, 2, 0, 1]);
    expect(places.mostInOneSlice).toBe(3);
    expect(Array.from(places.lat[0])).toEqual([10, 20, 10]);
    expect(Array.from(places.lon[0])).toEqual([5, 5, 6]);
    expect(Array.from(places.lat[1])).toEqual([10, 30]);
  });

  it('treats longitude -180 as 180, any longitude at a pole as one place, and -0 as 0', () => {
    // The same points on the sphere, written differently (common practice in spherical geometry).
    const lat = Float64Array.from([12, 12, 90, 90, -90, -90, 0, -0]);
    const lon = Float64Array.from([-180, 180, 15, -70, 0, 33, -0, 0]);
    expect(Array.from(slicePositions(lat, lon, Uint32Array.from([0, 8])).codes)).toEqual([0, 0, 1, 1, 2, 2, 3, 3]);
  });

  it('agrees with string keys on random positions drawn from a small set (property)', () => {
    const latitude = fc.constantFrom(-90, -45.5, 0, 1e-9, 45.5, 90);
    const longitude = fc.constantFrom(-180, -1.25, 0, 1.25, 179.999, 180);
    fc.assert(
      fc.property(fc.array(fc.tuple(latitude, longitude), { maxLength: 300 }), (points) => {
        const key = ([la, lo]: [number, number]) => (Math.abs(la) === 90 ? `${la}` : `${la + 0},${lo === -180 ? 180 : lo}`);
        const ids = new Map<string, number>();
        const expected = points.map((p) => {
          if (!ids.has(key(p))) ids.set(key(p), ids.size);
          return ids.get(key(p));
        });
        const places = slicePositions(Float64Array.from(points.map((p) => p[0])), Float64Array.from(points.map((p) => p[1])), Uint32Array.from([0, points.length]));
        expect(Array.from(places.codes)).toEqual(expected);
        expect(places.lat[0].length).toBe(ids.size);
      }),
    );
  });
});
