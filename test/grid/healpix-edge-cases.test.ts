// HEALPix edge cases: poles, the antimeridian, positions on cell boundaries, the z = ±2/3 switch
// between the paper's polar and equatorial formulas, and bad input. Expected cells are worked from
// the base layout of Górski et al. (2005), ApJ 622:759 (base cells 0–3 north, 4–7 belt, 8–11 south,
// each row eastward from φ = 0; ring centres as in healpix-reference.test.ts). The boundary rule is
// ours (documented on HealpixGrid): a position on a boundary belongs to the cell east of it.
import { describe, expect, it } from 'vitest';
import { HealpixGrid } from '../../src/grid';
import { lonDifference } from './d3-rings';

const DEG = 180 / Math.PI;
const Z_TWO_THIRDS_LAT = Math.asin(2 / 3) * DEG;

describe('HEALPix at the poles', () => {
  it('puts a pole in one cell whatever longitude comes with it', () => {
    for (const nside of [1, 2, 16, 8192]) {
      const grid = new HealpixGrid(nside);
      for (const lon of [0, 45, 100, -170, 1000]) {
        // The pole is the north corner of base cells 0–3; taken at lon 0 it is in cell 0's north-most child.
        expect(grid.cellOf(90, lon)).toBe(nside * nside - 1);
        // The south pole is the south corner of base cells 8–11: cell 8's first child.
        expect(grid.cellOf(-90, lon)).toBe(8 * nside * nside);
      }
    }
  });

  it('puts positions just off the pole in the cell of their own longitude', () => {
    const grid = new HealpixGrid(16);
    // Base cell 1 spans longitudes 90°…180° in the north cap; its north-most child is 2·256 − 1.
    expect(grid.cellOf(89.9999999, 100)).toBe(2 * 256 - 1);
    // Base cell 11 spans 270°…360° in the south cap; its first child is 11·256.
    expect(grid.cellOf(-89.9999999, -10)).toBe(11 * 256);
  });
});

describe('HEALPix longitudes', () => {
  it('gives longitudes 180° and -180° the same cell', () => {
    const grid = new HealpixGrid(32);
    for (let lat = -89.5; lat <= 89.5; lat += 0.7) expect(grid.cellOf(lat, 180)).toBe(grid.cellOf(lat, -180));
  });

  it('takes longitudes outside [-180°, 180°] modulo 360°', () => {
    const grid = new HealpixGrid(32);
    for (const lat of [-75, -20, 0, 33.3, 80]) {
      expect(grid.cellOf(lat, 190)).toBe(grid.cellOf(lat, -170));
      expect(grid.cellOf(lat, -190)).toBe(grid.cellOf(lat, 170));
      expect(grid.cellOf(lat, 725.5)).toBe(grid.cellOf(lat, 5.5));
      expect(grid.cellOf(lat, 1e6)).toBe(grid.cellOf(lat, -80)); // 1e6 = 2778·360 − 80
    }
  });
});

describe('HEALPix boundaries', () => {
  it('gives a position on a boundary to the cell east of it', () => {
    // nside 1: (0°, 45°) is the corner shared by base cells 0 (south corner), 8 (north corner),
    // 4 (east corner) and 5 (west corner); the cell east of it is 5.
    expect(new HealpixGrid(1).cellOf(0, 45)).toBe(5);
    // nside 2: (0°, 0°) is the centre of base cell 4, where its children 16 (S), 17 (E), 18 (W), 19 (N) meet.
    expect(new HealpixGrid(2).cellOf(0, 0)).toBe(17);
    // In the caps the base cells meet along the meridians 0°, 90°, 180°, 270°.
    const one = new HealpixGrid(1);
    expect(one.cellOf(70, 0)).toBe(0);
    expect(one.cellOf(70, 90)).toBe(1);
    expect(one.cellOf(70, 180)).toBe(2);
    expect(one.cellOf(70, -90)).toBe(3);
    expect(one.cellOf(-70, 90)).toBe(9);
    expect(one.cellOf(-70, -180)).toBe(10);
  });

  it('gives every cell corner on the equator to the cell east of it', () => {
    // On the equator (belt ring i = 2·nside, s = (nside + 1) mod 2) cell centres sit at
    // φ = (j − s/2)·90°/nside, so the corners between them are at 45°·m/nside with m + nside even;
    // the cell east of a corner is centred 45°/nside further east, on the equator.
    const c = new Float64Array(2);
    for (const nside of [1, 2, 4, 8, 64]) {
      const grid = new HealpixGrid(nside);
      for (let m = -4 * nside + (nside % 2); m < 4 * nside; m += 2) {
        const lon = (m * 45) / nside;
        grid.cellCentreInto(grid.cellOf(0, lon), c);
        expect(c[0]).toBe(0);
        expect(lonDifference(c[1], lon)).toBeCloseTo(45 / nside, 12);
      }
    }
  });
});

describe('HEALPix at z = ±2/3', () => {
  it('keeps positions just north and south of z = ±2/3 in the cell centred on that ring', () => {
    // Belt ring i = nside lies on z = 4/3 − 2/3 = 2/3 (s = 1): centres at φ = (j − 1/2)·90°/nside.
    // Positions a hair either side of the ring, near a centre, must stay in that centre's cell,
    // although they are computed with the paper's cap and belt formulas respectively.
    const c = new Float64Array(2);
    for (const nside of [1, 2, 4, 8, 16, 1024]) {
      const grid = new HealpixGrid(nside);
      const width = 90 / nside;
      for (let j = 1; j <= 4 * nside; j += Math.max(1, nside / 4)) {
        const lon = (j - 0.5) * width - 180;
        for (const sign of [1, -1]) {
          const lat = sign * Z_TWO_THIRDS_LAT;
          const cells = new Set<number>();
          for (const dLat of [-1e-9, 0, 1e-9]) for (const dLon of [-0.01, 0, 0.01]) cells.add(grid.cellOf(lat + dLat, lon + dLon * width));
          expect(cells.size).toBe(1);
          grid.cellCentreInto([...cells][0], c);
          expect(c[0]).toBeCloseTo(lat, 10);
          expect(lonDifference(c[1], lon)).toBeCloseTo(0, 10);
        }
      }
    }
  });
});

describe('HEALPix input checks', () => {
  it('refuses an nside that is not a power of two from 1 to 8192', () => {
    for (const nside of [0, 3, 12, 16384, 2.5, -4, Number.NaN]) {
      expect(() => new HealpixGrid(nside)).toThrow(`HEALPix nside ${nside} is not allowed: expected a power of two from 1 to 8192.`);
    }
  });

  it('refuses positions off the sphere, naming the value and, in a batch, its index', () => {
    const grid = new HealpixGrid(4);
    expect(() => grid.cellOf(91, 0)).toThrow('Position: latitude 91 is outside [-90, 90] degrees.');
    expect(() => grid.cellOf(Number.NaN, 0)).toThrow('Position: latitude NaN is outside [-90, 90] degrees.');
    expect(() => grid.cellOf(0, Number.POSITIVE_INFINITY)).toThrow('Position: longitude Infinity is not a finite number of degrees.');
    const lat = Float64Array.from([0, 10, -90.5]);
    const lon = Float64Array.from([0, 10, 10]);
    expect(() => grid.cellsOf(lat, lon, new Uint32Array(3))).toThrow('Position 2: latitude -90.5 is outside [-90, 90] degrees.');
    expect(() => grid.cellsOf(lat, lon, new Uint32Array(2))).toThrow(
      'Batch lengths differ: 3 latitudes, 3 longitudes, 2 output slots; expected all equal.',
    );
  });

  it('refuses cell numbers that are not cells of the grid, and a step that is not positive', () => {
    const grid = new HealpixGrid(2);
    const out = new Float64Array(2);
    for (const cell of [-1, 48, 1.5, Number.NaN]) {
      expect(() => grid.cellCentreInto(cell, out)).toThrow(`Cell ${cell} is not a cell of healpix:2: expected an integer from 0 to 47.`);
      expect(() => grid.cellRing(cell)).toThrow(`Cell ${cell} is not a cell of healpix:2`);
    }
    for (const step of [0, -1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(() => grid.cellRing(0, step)).toThrow(`Outline step ${step} is not allowed: expected a positive number of degrees.`);
    }
  });
});
