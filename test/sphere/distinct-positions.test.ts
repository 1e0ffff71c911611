import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { distinctPositions } from '../../src/sphere/distinct-positions';
import { samePosition } from '../../src/sphere/position-identity';

// Reference: the definition, written the slow obvious way — a Map keyed by the text of the
// canonical degree values (lon −180 written as 180, any longitude at a pole as 0, −0 as 0).
function referenceDistinct(lat: Float64Array, lon: Float64Array, rows: Uint32Array) {
  const seen = new Map<string, number>();
  for (const r of rows) {
    const la = lat[r] + 0;
    const lo = la === 90 || la === -90 ? 0 : lon[r] === -180 ? 180 : lon[r] + 0;
    const key = `${la}|${lo}`;
    if (!seen.has(key)) seen.set(key, r);
  }
  const firstRows = [...seen.values()];
  return { lat: firstRows.map((r) => lat[r]), lon: firstRows.map((r) => lon[r]) };
}

const all = (n: number) => Uint32Array.from({ length: n }, (_, i) => i);

describe('distinct positions', () => {
  it('treat longitude −180 and 180, any longitude at a pole, and −0 and 0 as one place', () => {
    const lat = Float64Array.of(10, 10, 90, 90, -90, -90, -0, 0, 0);
    const lon = Float64Array.of(-180, 180, 0, 55, -12, 170, 5, 5, -0);
    const d = distinctPositions(lat, lon, all(lat.length));
    expect(Array.from(d.lat)).toEqual([10, 90, -90, -0, 0]);
    expect(Array.from(d.lon)).toEqual([-180, 0, -12, 5, -0]); // values kept as given
  });

  it('compare degree values exactly, so 0.1 + 0.2 and 0.3 are two places', () => {
    const d = distinctPositions(Float64Array.of(0.1 + 0.2, 0.3), Float64Array.of(1, 1), all(2));
    expect(d.lat.length).toBe(2);
  });

  it('keep the values of each place’s first listed row, in order of first appearance', () => {
    const lat = Float64Array.of(5, 6, 5, 7, 6);
    const lon = Float64Array.of(1, -180, 1, 3, 180);
    const d = distinctPositions(lat, lon, Uint32Array.of(4, 3, 2, 1, 0));
    expect(Array.from(d.lat)).toEqual([6, 7, 5]);
    expect(Array.from(d.lon)).toEqual([180, 3, 1]);
  });

  it('look only at the listed rows', () => {
    const d = distinctPositions(Float64Array.of(1, 2, 3), Float64Array.of(1, 2, 3), Uint32Array.of(2));
    expect(Array.from(d.lat)).toEqual([3]);
    expect(distinctPositions(Float64Array.of(1), Float64Array.of(1), new Uint32Array(0)).lat.length).toBe(0);
  });

  it('agree with a plain Map of text keys on random tables with many repeats (property)', () => {
    const coarse = fc.oneof(
      fc.integer({ min: -4, max: 4 }).map((k) => k * 22.5),
      fc.constantFrom(-180, 180, 90, -90, -0),
      fc.double({ min: -90, max: 90, noNaN: true }),
    );
    fc.assert(fc.property(fc.array(fc.tuple(coarse, coarse.map((x) => 2 * x)), { maxLength: 3000 }), (pairs) => {
      const lat = Float64Array.from(pairs, (p) => p[0]);
      const lon = Float64Array.from(pairs, (p) => p[1]);
      const rows = Uint32Array.from(all(pairs.length).filter((i) => i % 3 !== 1));
      const got = distinctPositions(lat, lon, rows);
      const want = referenceDistinct(lat, lon, rows);
      expect(Array.from(got.lat)).toEqual(want.lat);
      expect(Array.from(got.lon)).toEqual(want.lon);
    }), { numRuns: 200, seed: 21 });
  });

  it('return each place once however many thousand distinct places there are (hash table growth)', () => {
    const n = 50_000;
    const lat = Float64Array.from({ length: 2 * n }, (_, i) => ((i % n) * 0.001) - 25);
    const lon = Float64Array.from({ length: 2 * n }, (_, i) => (i % n) % 7);
    const d = distinctPositions(lat, lon, all(2 * n));
    expect(d.lat.length).toBe(n);
    for (let i = 0; i < n; i += 997) expect(samePosition(d.lat[i], d.lon[i], lat[i], lon[i])).toBe(true);
  });
});

describe('samePosition', () => {
  it('is true only for the same place', () => {
    expect(samePosition(-90, 3, -90, 100)).toBe(true);
    expect(samePosition(45, -180, 45, 180)).toBe(true);
    expect(samePosition(45, -180, 45, -179.99999999999997)).toBe(false);
    expect(samePosition(89.99999999999999, 3, 89.99999999999999, 100)).toBe(false);
  });
});
