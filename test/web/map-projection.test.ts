// Projections of the equal-area map, checked against closed forms and d3-geo itself:
// - Lambert azimuthal equal-area: a point at angular distance c from the centre lies at
//   ρ = 2R·sin(c/2) from it (Snyder 1987, Map Projections — A Working Manual, USGS PP 1395,
//   eq. 24-1 ff., from memory), so the equator (c = 90°) is at R·√2 and the pole at the centre;
// - Equal Earth (Šavrič, Patterson & Jenny 2018) is equal-area: a 10° × 10° box keeps the area
//   ratio of R²·Δλ·(sin φN − sin φS) wherever it sits (checked by d3 path.area on the projection);
// - the reference-plus-frame placement agrees with d3's own fitExtent for the same box.
import { geoPath } from 'd3-geo';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitFrame, frameInverseInto } from '../../web/equal-area/map-frame';
import { EQUAL_AREA_PROJECTIONS, POLAR_CLIP_DEG, PROJECTION_CAPTIONS, fittedProjection, isOnMap, referenceProjection } from '../../web/equal-area/map-projection';
import { HealpixGrid } from '../../src/grid';
import { framePoint } from './frame-point';
import { boxRing } from './small-analysis-view';

const RADIANS = Math.PI / 180;

describe('the polar projections', () => {
  for (const [kind, pole] of [['polar-north', 90], ['polar-south', -90]] as const) {
    it(`put the ${kind === 'polar-north' ? 'North' : 'South'} Pole at the centre of the box and the equator on its inscribed circle (${kind})`, () => {
      const projection = fittedProjection(kind, 0, 0, 600, 400);
      const centre = projection([37, pole])!;
      expect(centre[0]).toBeCloseTo(300, 6);
      expect(centre[1]).toBeCloseTo(200, 6);
      // Fitted to the box: the hemisphere's outline touches the shorter side, so the equator
      // (a hair beyond the clip, see POLAR_CLIP_DEG) lies at radius 200.
      for (const lon of [-170, -45, 0, 90, 135]) {
        const [x, y] = projection([lon, 0])!;
        expect(Math.hypot(x - 300, y - 200)).toBeCloseTo(200, 2);
      }
    });
  }

  it('place latitude 30° N at 2R·sin(30°) from the centre, the outline being the clip circle at 2R·sin(c/2)', () => {
    const projection = fittedProjection('polar-north', 0, 0, 500, 500);
    const R = 250 / (2 * Math.sin((POLAR_CLIP_DEG / 2) * RADIANS)); // the outline touches the box
    const [x, y] = projection([120, 30])!;
    expect(Math.hypot(x - 250, y - 250)).toBeCloseTo(2 * R * Math.sin(30 * RADIANS), 6);
  });

  it('draw one hemisphere only, and say so in the caption', () => {
    expect(isOnMap('polar-north', 10)).toBe(true);
    expect(isOnMap('polar-north', -10)).toBe(false);
    expect(isOnMap('polar-south', -10)).toBe(true);
    expect(isOnMap('equal-earth', -10)).toBe(true);
    expect(PROJECTION_CAPTIONS['polar-north']).toContain('northern hemisphere only');
    expect(PROJECTION_CAPTIONS['polar-south']).toContain('southern hemisphere only');
    const projection = fittedProjection('polar-north', 0, 0, 500, 500);
    expect(geoPath(projection).area({ type: 'Polygon', coordinates: [boxRing(0, -40, 20, -20).slice().reverse()] })).toBe(0);
  });
});

describe('every HEALPix cell drawn through the map projections', () => {
  // Equal-area projections of scale k map Ω sr to k²·Ω px² (k is d3's projection.scale(), the
  // radius in px): so each nside-8 cell, 4π/768 sr (Górski et al. 2005), must cover k²·4π/768 px²
  // — where it is shown at all. A cell clipped into "the rest of the hemisphere" (d3's reading
  // of a ring with a vertex on its clip circle) or left in RFC 7946 order fails this.
  const grid = new HealpixGrid(8);
  const cells = Array.from({ length: grid.cellCount }, (_, c) => c);
  const polygons = cells.map((c) => ({ type: 'Polygon' as const, coordinates: [grid.cellRing(c, 0.25).slice().reverse()] }));
  const lats = polygons.map((p) => p.coordinates[0].map(([, lat]) => lat));

  for (const kind of EQUAL_AREA_PROJECTIONS) {
    it(`cover k² times their area where shown and nothing where hidden (${kind})`, () => {
      // d3 follows a projected edge to within `precision` px (adaptive resampling, 0.7 px by
      // default); the edge d3 itself adds where it cuts a cell at the antimeridian is not
      // densified, so at 0.7 px a cell split there loses up to a few % of a 1000 px map's cell.
      const projection = fittedProjection(kind, 0, 0, 1000, 1000).precision(0.01);
      const full = projection.scale() ** 2 * grid.cellAreaSr;
      const path = geoPath(projection);
      polygons.forEach((polygon, c) => {
        const area = path.area(polygon);
        const sign = kind === 'polar-north' ? 1 : -1;
        const shown = kind === 'equal-earth' || lats[c].every((lat) => sign * lat >= 0);
        const hidden = kind !== 'equal-earth' && lats[c].every((lat) => sign * lat <= 0);
        // 0.25° chords: the chord polygon is within 1e-4 of the cell's area.
        if (shown) expect(Math.abs(area / full - 1), `cell ${c}`).toBeLessThan(1e-3);
        else if (hidden) expect(area, `cell ${c}`).toBeLessThan(1e-6 * full);
        else expect(area, `cell ${c}`).toBeLessThan(full);
      });
    });
  }
});

describe('Equal Earth', () => {
  it('keeps areas in proportion: a 10° box near the pole and one on the equator keep the ratio of their true areas', () => {
    const projection = fittedProjection('equal-earth', 0, 0, 1000, 600);
    const area = (w: number, s: number) => geoPath(projection).area({ type: 'Polygon', coordinates: [boxRing(w, s, w + 10, s + 10).slice().reverse()] });
    const trueRatio = (Math.sin(80 * RADIANS) - Math.sin(70 * RADIANS)) / (Math.sin(10 * RADIANS) - Math.sin(0));
    expect(area(30, 70) / area(-100, 0) / trueRatio).toBeCloseTo(1, 2);
  });
});

describe('fitFrame', () => {
  it('places the reference picture where d3 fitExtent puts the projection fitted to the same box', () => {
    fc.assert(fc.property(
      fc.constantFrom(...EQUAL_AREA_PROJECTIONS), fc.integer({ min: 120, max: 2000 }), fc.integer({ min: 120, max: 1400 }),
      fc.double({ min: -179, max: 179, noNaN: true }), fc.double({ min: -89, max: 89, noNaN: true }),
      (kind, width, height, lon, lat) => {
        if (!isOnMap(kind, lat)) return;
        const reference = referenceProjection(kind);
        const frame = fitFrame(reference, 6, 6, width - 6, height - 6);
        const [xr, yr] = reference.projection([lon, lat])!;
        const placed = framePoint(frame, xr, yr);
        const [x, y] = fittedProjection(kind, 6, 6, width - 6, height - 6)([lon, lat])!;
        // d3 fits on its resampled outline at scale 150, we on the one at REFERENCE_SIZE: both
        // are the exact outline within d3's resampling precision, far below a hundredth of a pixel here.
        expect(Math.abs(placed[0] - x)).toBeLessThan(0.01);
        expect(Math.abs(placed[1] - y)).toBeLessThan(0.01);
        const back = frameInverseInto(frame, placed[0], placed[1], new Float64Array(2));
        expect(back[0]).toBeCloseTo(xr, 9);
        expect(back[1]).toBeCloseTo(yr, 9);
      },
    ), { seed: 5, numRuns: 200 });
  });
});
