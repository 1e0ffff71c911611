import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  degreesToUnitVectors, degreesToUnitVectorsInto, unitVectorsToDegreesInto, writeUnitVector,
} from '../../src/sphere/unit-vectors';

// Reference: the definition of geocentric Cartesian coordinates on the unit sphere,
// x = cos φ cos λ, y = cos φ sin λ, z = sin φ (any geodesy text; common practice), computed
// here directly with radians.
const RAD = Math.PI / 180;
const direct = (latDeg: number, lonDeg: number) => [
  Math.cos(latDeg * RAD) * Math.cos(lonDeg * RAD), Math.cos(latDeg * RAD) * Math.sin(lonDeg * RAD), Math.sin(latDeg * RAD),
];

/** Degrees of interleaved vectors, through unitVectorsToDegreesInto. */
function degreesOf(xyz: Float64Array): { lat: Float64Array; lon: Float64Array } {
  const lat = new Float64Array(xyz.length / 3), lon = new Float64Array(xyz.length / 3);
  unitVectorsToDegreesInto(xyz, lat, lon);
  return { lat, lon };
}

const lat = fc.double({ min: -90, max: 90, noNaN: true });
const lon = fc.double({ min: -180, max: 180, noNaN: true });

describe('unit vectors', () => {
  it('match the textbook formula to rounding for random positions', () => {
    fc.assert(fc.property(lat, lon, (a, b) => {
      const v = degreesToUnitVectors(Float64Array.of(a), Float64Array.of(b));
      const w = direct(a, b);
      for (let k = 0; k < 3; k++) expect(Math.abs(v[k] - w[k])).toBeLessThan(1e-15);
    }), { numRuns: 1000, seed: 11 });
  });

  it('put the axes and both poles exactly where they belong', () => {
    const v = degreesToUnitVectors(Float64Array.of(0, 0, 90, -90, 0), Float64Array.of(0, 90, 123.4, -7, 180));
    expect(Array.from(v)).toEqual([1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, -1, -1, 0, 0]);
  });

  it('give bit-identical vectors for longitudes −180 and 180 and for any longitude at a pole', () => {
    const v = degreesToUnitVectors(Float64Array.of(37.5, 37.5, 90, 90), Float64Array.of(-180, 180, 0, -66));
    expect(Array.from(v.subarray(0, 3))).toEqual(Array.from(v.subarray(3, 6)));
    expect(Object.is(v[1], 0) && Object.is(v[4], 0)).toBe(true); // sin(±180°) is +0 on both, not −0
    expect(Array.from(v.subarray(6, 9))).toEqual(Array.from(v.subarray(9, 12)));
  });

  it('come back to the same degrees through the inverse (round trip)', () => {
    fc.assert(fc.property(fc.double({ min: -89.999, max: 89.999, noNaN: true }), fc.double({ min: -179.999, max: 180, noNaN: true }), (a, b) => {
      const back = degreesOf(degreesToUnitVectors(Float64Array.of(a), Float64Array.of(b)));
      expect(Math.abs(back.lat[0] - a)).toBeLessThan(1e-12);
      expect(Math.abs(back.lon[0] - b)).toBeLessThan(1e-11);
    }), { numRuns: 1000, seed: 12 });
  });

  it('read latitude and longitude from vectors that are not of unit length', () => {
    const back = degreesOf(Float64Array.of(0, 3, 3, 2, 0, 0));
    expect(back.lat[0]).toBeCloseTo(45, 13);
    expect(back.lon[0]).toBeCloseTo(90, 13);
    expect(back.lat[1]).toBe(0);
    expect(back.lon[1]).toBe(0);
  });

  it('write into a given array the same values as the allocating form and the one-position form', () => {
    const la = Float64Array.of(10, -20), lo = Float64Array.of(30, -40);
    const out = new Float64Array(6);
    expect(degreesToUnitVectorsInto(la, lo, out)).toBe(out);
    expect(Array.from(out)).toEqual(Array.from(degreesToUnitVectors(la, lo)));
    const one = new Float64Array(4);
    writeUnitVector(-20, -40, one, 1);
    expect(Array.from(one.subarray(1))).toEqual(Array.from(out.subarray(3)));
  });
});
