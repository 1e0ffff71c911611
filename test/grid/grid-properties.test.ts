// Invariants for random positions (fast-check), checked with d3-geo:
// - the outline of the cell a position falls in contains it (geoContains on the rewound ring);
// - the position is no further from the cell centre (geoDistance) than the farthest outline vertex.
// d3's geoContains decides to about 1e-6 rad, and reads edges as great circles where ours bend
// slightly between vertices, so a position it calls outside must at least lie on the outline:
// within half a step (plus 1e-5 rad) of a vertex.
// The NESTED hierarchy (Górski et al. 2005, ApJ 622:759): the cell at nside is the one at 2·nside
// shifted right by two bits.
import fc from 'fast-check';
import { geoContains, geoDistance } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { type EqualAreaGrid, HealpixGrid, LatitudeBandsGrid } from '../../src/grid';
import { d3Polygon } from './d3-rings';

const DEG = 180 / Math.PI;
const ON_OUTLINE_RAD = 1e-5;

/** Mostly uniform on the sphere (z = sin latitude uniform in [−1, 1]); now and then fast-check's own doubles, which favour extremes such as ±1, ±180 and 0. */
const uniform = (min: number, max: number) => fc.integer({ min: 0, max: 2 ** 30 }).map((k) => min + ((max - min) * k) / 2 ** 30);
const position = fc.record({
  z: fc.oneof({ arbitrary: uniform(-1, 1), weight: 4 }, { arbitrary: fc.double({ min: -1, max: 1, noNaN: true }), weight: 1 }),
  lon: fc.oneof({ arbitrary: uniform(-180, 180), weight: 4 }, { arbitrary: fc.double({ min: -180, max: 180, noNaN: true }), weight: 1 }),
});

function checkCellHolds(grid: EqualAreaGrid, lat: number, lon: number): void {
  const cell = grid.cellOf(lat, lon);
  const stepDeg = (Math.sqrt(grid.cellAreaSr) * DEG) / 1000;
  const ring = grid.cellRing(cell, stepDeg);
  const point: [number, number] = [lon, lat];
  if (!geoContains(d3Polygon(ring), point)) {
    const nearest = Math.min(...ring.map((v) => geoDistance(v, point)));
    expect(nearest, `${grid.name} cell ${cell} misses (${lat}, ${lon})`).toBeLessThan(stepDeg / DEG / 2 + ON_OUTLINE_RAD);
  }
  const c = grid.cellCentreInto(cell, new Float64Array(2));
  const centre: [number, number] = [c[1], c[0]];
  const radius = Math.max(...ring.map((v) => geoDistance(centre, v)));
  expect(geoDistance(centre, point)).toBeLessThanOrEqual(radius + 1e-12);
}

describe('grid properties for random positions', () => {
  it('HEALPix: the cell outline holds the position, within the cell radius of its centre', () => {
    const nside = fc.constantFrom(1, 2, 4, 8, 32, 256);
    fc.assert(
      fc.property(nside, position, (n, p) => checkCellHolds(new HealpixGrid(n), Math.asin(p.z) * DEG, p.lon)),
      { numRuns: 300 },
    );
  });

  it('bands: the cell outline holds the position, within the cell radius of its centre', () => {
    const deg = fc.constantFrom(90, 45, 30, 10, 5, 2, 0.5);
    fc.assert(
      fc.property(deg, position, (d, p) => checkCellHolds(new LatitudeBandsGrid(d), Math.asin(p.z) * DEG, p.lon)),
      { numRuns: 300 },
    );
  });

  it('HEALPix: the cell at nside is the cell at 2·nside shifted right by two bits', () => {
    const order = fc.integer({ min: 0, max: 12 });
    fc.assert(
      fc.property(order, position, (k, p) => {
        const lat = Math.asin(p.z) * DEG;
        const coarse = new HealpixGrid(2 ** k).cellOf(lat, p.lon);
        const fine = new HealpixGrid(2 ** (k + 1)).cellOf(lat, p.lon);
        expect(fine >>> 2).toBe(coarse);
      }),
      { numRuns: 1000 },
    );
  });
});
