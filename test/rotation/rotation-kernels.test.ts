import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { degreesOfRowsInto, rotateRowsInto } from '../../src/rotation/rotation-kernels';
import { PlateAgeGroups } from '../../src/rotation/plate-age-groups';
import { apply, poleMatrix, unit } from './rodrigues';

// Reference: rotation matrices by Rodrigues' formula (./rodrigues), applied to unit vectors
// from Math.sin and Math.cos.
const RAD = Math.PI / 180;
const lat = fc.double({ min: -90, max: 90, noNaN: true });
const lon = fc.double({ min: -180, max: 180, noNaN: true });

describe('rotating runs of rows', () => {
  it('turns each row by its group’s matrix and back to degrees as a Rodrigues matrix does, NaN for rows without a group', () => {
    fc.assert(fc.property(fc.array(fc.tuple(lat, lon, fc.integer({ min: -1, max: 2 })), { minLength: 1, maxLength: 40 }), (rows) => {
      const poles: Array<[number, number, number]> = [[10, 20, 30], [-60, 170, -150], [89, -45, 179]];
      const matrices = Float64Array.from(poles.flatMap(([a, b, c]) => poleMatrix(a, b, c)));
      const group = Int32Array.from(rows, (r) => r[2]);
      const xyz = new Float64Array(3 * rows.length), outLat = new Float64Array(rows.length + 2), outLon = new Float64Array(rows.length + 2);
      const la = Float64Array.from([0, ...rows.map((r) => r[0])]), lo = Float64Array.from([0, ...rows.map((r) => r[1])]);
      rotateRowsInto(la, lo, 1, rows.length + 1, group, matrices, xyz);
      degreesOfRowsInto(xyz, 1, rows.length + 1, group, outLat, outLon);
      rows.forEach(([a, b, g], j) => {
        if (g < 0) {
          expect(outLat[j + 1]).toBeNaN();
          return;
        }
        const [x, y, z] = apply(poleMatrix(...poles[g]), unit(a, b));
        expect(Math.abs(outLat[j + 1] - Math.atan2(z, Math.hypot(x, y)) / RAD)).toBeLessThan(1e-11);
        // Longitude is meaningless at the poles; compare the point instead of the angle there.
        const back = unit(outLat[j + 1], outLon[j + 1]);
        expect(Math.hypot(back[0] - x, back[1] - y, back[2] - z)).toBeLessThan(1e-13);
      });
      expect(outLat[0]).toBe(0);
      expect(outLat[rows.length + 1]).toBe(0);
    }), { numRuns: 300 });
  });
});

describe('numbering (plate, age) pairs', () => {
  it('gives equal pairs one number and distinct pairs distinct numbers, in order of first sight', () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 5000 }), fc.constantFrom(0, -0, 1.5, 66, 251.902, 1e-300)), { maxLength: 400 }), (pairs) => {
      const groups = new PlateAgeGroups();
      const seen = new Map<string, number>();
      for (const [plate, age] of pairs) {
        const key = `${plate}|${age === 0 ? 0 : age}`;
        const expected = seen.get(key) ?? seen.size;
        seen.set(key, expected);
        expect(groups.groupOf(plate, age)).toBe(expected);
      }
      expect(groups.count).toBe(seen.size);
      for (const [key, g] of seen) expect(`${groups.plateId[g]}|${groups.ageMa[g]}`).toBe(key);
    }), { numRuns: 200 });
  });
});
