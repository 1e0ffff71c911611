// The globe lift: checked in three dimensions against the sphere itself. A point of a flat
// triangle lifted by h (each vertex moved out radially by h, as deck's altitude does) must lie at
// least R from the centre. Positions → unit vectors by the usual spherical-to-Cartesian formula;
// great-circle angles from d3-geo's geoDistance (a general-purpose reference library).
import { geoDistance } from 'd3-geo';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';
import { countScale } from '../../web/colour/measure-scale';
import { buildCellPolygons } from '../../web/map/cell-polygons';
import { angleBoundDeg, LIFT_MARGIN_M, liftForCapMetres, liftMatrix } from '../../web/map/globe-lift';

const R = EARTH_RADIUS_KM * 1000;
const RAD = Math.PI / 180;
const point = (lon: number, lat: number, r: number): [number, number, number] =>
  [r * Math.cos(lat * RAD) * Math.cos(lon * RAD), r * Math.cos(lat * RAD) * Math.sin(lon * RAD), r * Math.sin(lat * RAD)];

describe('angleBoundDeg', () => {
  it('is never below the great-circle angle by d3-geo geoDistance', () => {
    fc.assert(fc.property(
      fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }),
      fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }),
      (lon1, lat1, lon2, lat2) => {
        const exact = geoDistance([lon1, lat1], [lon2, lat2]) / RAD;
        return angleBoundDeg(lon1, lat1, lon2, lat2) >= exact - 1e-9;
      },
    ));
  });

  it('is exact along a meridian and along the equator', () => {
    // Both paths it measures are then the great circle itself.
    expect(angleBoundDeg(30, 10, 30, 25)).toBeCloseTo(15, 12);
    expect(angleBoundDeg(-20, 0, 5, 0)).toBeCloseTo(25, 12);
  });
});

describe('liftForCapMetres', () => {
  it('is the sagitta R(1 − cos θ) plus the margin: 1° gives about 970 m', () => {
    // cos 1° = 0.9998477 (four-figure tables give 0.9998), so R(1 − cos 1°) = 6 371 008.8 m × 1.523e-4 ≈ 970.3 m.
    expect(liftForCapMetres(1) - LIFT_MARGIN_M).toBeCloseTo(970.3, 0);
    expect(liftForCapMetres(0)).toBe(LIFT_MARGIN_M);
  });

  it('puts a 4×4 translation of the altitude in deck’s column-major matrix', () => {
    expect([...liftMatrix(123)]).toEqual([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 123, 1]);
  });

  it('keeps every lifted fan triangle of every HEALPix nside-8 cell outside the sphere', () => {
    const grid = new HealpixGrid(8);
    const ringStart = [0];
    const coords: number[] = [];
    for (let cell = 0; cell < grid.cellCount; cell++) {
      for (const [lon, lat] of grid.cellRing(cell, 2)) coords.push(lon, lat);
      ringStart.push(coords.length / 2);
    }
    const ids = Uint32Array.from({ length: grid.cellCount }, (_, k) => k);
    const built = buildCellPolygons(
      { sliceStart: Uint32Array.of(0, grid.cellCount), cell: ids, shape: ids, occurrences: ids, collections: ids, taxa: ids },
      { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: new Float32Array(0) }, 0, ids, countScale(2),
    );
    const lift = liftForCapMetres(built.reachDeg) - LIFT_MARGIN_M;
    const p = built.positions;
    let closest = Infinity;
    for (let t = 0; t < built.indices.length; t += 3) {
      const [a, b, c] = [0, 1, 2].map((j) => point(p[built.indices[t + j] * 2], p[built.indices[t + j] * 2 + 1], R + lift));
      for (const [u, v] of [[1 / 3, 1 / 3], [0.5, 0.5], [0.5, 0], [0, 0.5], [0.25, 0.5], [0.5, 0.25]]) {
        const q = [0, 1, 2].map((k) => (1 - u - v) * a[k] + u * b[k] + v * c[k]);
        closest = Math.min(closest, Math.hypot(q[0], q[1], q[2]));
      }
    }
    expect(closest).toBeGreaterThanOrEqual(R);
    // …and not absurdly far out: within the lift itself.
    expect(closest - R).toBeLessThan(lift);
  });
});

