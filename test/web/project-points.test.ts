// projectPointsInto against d3-geo's own point projection (projection([lon, lat])) and d3's clip
// rule: a polar map clipped at POLAR_CLIP_DEG shows only points nearer its pole (geoDistance).
import { geoDistance } from 'd3-geo';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EQUAL_AREA_PROJECTIONS, POLAR_CLIP_DEG, fittedProjection } from '../../web/equal-area/map-projection';
import { projectPointsInto } from '../../web/equal-area/project-points';

const CLIP = (POLAR_CLIP_DEG * Math.PI) / 180;
const CENTRE = { 'equal-earth': undefined, 'polar-north': [0, 90], 'polar-south': [0, -90] } as const;

describe('projectPointsInto', () => {
  it('writes d3\'s projected position of every visible point and NaN for the ones the clip hides', () => {
    fc.assert(fc.property(
      fc.constantFrom(...EQUAL_AREA_PROJECTIONS),
      fc.array(fc.tuple(fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true })), { minLength: 1, maxLength: 40 }),
      (kind, points) => {
        const projection = fittedProjection(kind, 0, 0, 800, 500);
        const lon = Float32Array.from(points, (p) => p[0]), lat = Float32Array.from(points, (p) => p[1]);
        const out = new Float32Array(2 * points.length);
        const visible = projectPointsInto(projection, lon, lat, 0, points.length, out);
        let seen = 0;
        for (let i = 0; i < points.length; i++) {
          const centre = CENTRE[kind];
          const distance = centre === undefined ? 0 : geoDistance([lon[i], lat[i]], [centre[0], centre[1]]);
          // d3 rotates through asin, which near ±90° resolves angles only to about √ε ≈ 1.5e-8 rad:
          // points that close to the clip circle may fall either side of it.
          if (Math.abs(distance - CLIP) < 1e-7) continue;
          if (distance < CLIP) {
            const [x, y] = projection([lon[i], lat[i]])!;
            expect(out[2 * i]).toBeCloseTo(x, 2);
            expect(out[2 * i + 1]).toBeCloseTo(y, 2);
            seen++;
          } else {
            expect(out[2 * i]).toBeNaN();
            expect(out[2 * i + 1]).toBeNaN();
          }
        }
        expect(visible).toBeGreaterThanOrEqual(seen);
      },
    ), { seed: 3, numRuns: 200 });
  });

  it('fills only the requested run, at the requested place in the output', () => {
    const projection = fittedProjection('equal-earth', 0, 0, 800, 400);
    const lon = Float32Array.of(0, 10, 20, 30), lat = Float32Array.of(0, 5, 10, 15);
    const out = new Float32Array(4).fill(-1);
    expect(projectPointsInto(projection, lon, lat, 2, 4, out, 0)).toBe(2);
    const [x, y] = projection([20, 10])!;
    expect(out[0]).toBeCloseTo(x, 3);
    expect(out[1]).toBeCloseTo(y, 3);
    const whole = new Float32Array(8).fill(-1);
    projectPointsInto(projection, lon, lat, 1, 2, whole);
    expect([whole[0], whole[1], whole[4], whole[5]]).toEqual([-1, -1, -1, -1]);
    expect(whole[2]).toBeCloseTo(projection([10, 5])![0], 3);
  });
});
