import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import geodesic from 'geographiclib-geodesic';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { polygonAreaKm2, polygonAreaSr } from '../../src/sphere/polygon-area';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';

const RAD = Math.PI / 180;
const R2 = EARTH_RADIUS_KM * EARTH_RADIUS_KM;

// Reference: GeographicLib's PolygonArea (Karney 2013, J. Geodesy 87, §6) on a sphere of the
// same radius (flattening 0), signed and counter-clockwise positive; area in m².
const sphere = new geodesic.Geodesic.Geodesic(EARTH_RADIUS_KM * 1000, 0);
function referenceKm2(lat: ArrayLike<number>, lon: ArrayLike<number>): number {
  const polygon = sphere.Polygon(false);
  for (let i = 0; i < lat.length; i++) polygon.AddPoint(lat[i], lon[i]);
  return polygon.Compute(false, true).area! / 1e6;
}

/** A simple polygon: vertices at increasing bearings around a centre, at random distances. */
function starPolygon(centreLat: number, centreLon: number, radii: number[], bearings: number[]) {
  const sorted = [...bearings].sort((a, b) => a - b);
  const lat: number[] = [], lon: number[] = [];
  for (let k = 0; k < radii.length; k++) {
    // Counter-clockwise seen from outside = bearings decreasing (bearings run clockwise from north).
    const p = sphere.Direct(centreLat, centreLon, -sorted[k], radii[k] * 1000);
    lat.push(p.lat2!);
    lon.push(p.lon2!);
  }
  return { lat: Float64Array.from(lat), lon: Float64Array.from(lon) };
}

describe('polygon area', () => {
  it('gives an octant of the sphere, 4πR²/8, for the triangle between the equator, 90°E and the pole (closed form)', () => {
    const lat = Float64Array.of(0, 0, 90), lon = Float64Array.of(0, 90, 0);
    expect(polygonAreaSr(degreesToUnitVectors(lat, lon))).toBeCloseTo(Math.PI / 2, 14);
    expect(polygonAreaKm2(degreesToUnitVectors(lat, lon)) / ((4 * Math.PI * R2) / 8)).toBeCloseTo(1, 14);
  });

  it('is negative for a clockwise ring', () => {
    expect(polygonAreaSr(degreesToUnitVectors(Float64Array.of(90, 0, 0), Float64Array.of(0, 90, 0)))).toBeCloseTo(-Math.PI / 2, 14);
  });

  // Worked example, L'Huilier's theorem (e.g. Todhunter 1886, Spherical Trigonometry, Art. 102):
  // A = (0°, 0°), B = (0°, 60°E), C = (60°N, 0°). Sides AB = AC = 60°, BC = arccos(cos²60°) =
  // arccos 0.25 = 75.522488°; s = 97.761244°. tan(s/2) = 1.145539, tan((s−a)/2) = 0.196543,
  // tan((s−b)/2) = tan((s−c)/2) = 0.341999; tan(E/4) = √(1.145539 × 0.196543 × 0.341999²) = 0.161938...
  // so E = 0.6435011 sr (36.8699°). Check by Girard's theorem: the angle at A is 90°, and at B and
  // C it is arctan(tan 60° / sin 60°) = arctan 2 = 63.4349° (Napier's rules), so
  // E = 90° + 2 × 63.4349° − 180° = 36.8699°; indeed E = arctan(3/4).
  it('matches a triangle worked by L’Huilier’s theorem and by Girard’s theorem', () => {
    expect(polygonAreaSr(degreesToUnitVectors(Float64Array.of(0, 0, 60), Float64Array.of(0, 60, 0)))).toBeCloseTo(Math.atan(3 / 4), 14);
  });

  // A regular N-gon inscribed in the circle of angular radius θ about the pole is N isosceles
  // triangles with two sides θ and apex angle α = 2π/N, each of area E with
  // tan(E/2) = tan²(θ/2) sin α / (1 + tan²(θ/2) cos α) (area from two sides and the included
  // angle; Todhunter 1886, Art. 102 — quoted from memory). It contains the cap of radius θ′
  // reaching its edge midpoints, tan θ′ = tan θ cos(α/2) (Napier's rules), and lies inside the cap
  // of radius θ, so 2π(1 − cos θ′) ≤ area ≤ 2π(1 − cos θ): the inscribed polygon error bound.
  it.each([
    [3, 10], [60, 1], [1000, 30], [360, 80], [4, 89.9], [5000, 1e-4],
  ])('gives a regular %i-gon at %f° from the pole its closed-form area, inside the cap bounds', (sides, thetaDeg) => {
    const theta = thetaDeg * RAD;
    const alpha = (2 * Math.PI) / sides;
    const lat = new Float64Array(sides).fill(90 - thetaDeg);
    const lon = Float64Array.from({ length: sides }, (_, k) => -180 + (360 * k) / sides);
    const area = polygonAreaSr(degreesToUnitVectors(lat, lon));
    const t2 = Math.tan(theta / 2) ** 2;
    const exact = sides * 2 * Math.atan2(t2 * Math.sin(alpha), 1 + t2 * Math.cos(alpha));
    expect(Math.abs(area - exact)).toBeLessThanOrEqual(1e-12 * exact + 1e-18);
    const thetaInner = Math.atan(Math.tan(theta) * Math.cos(alpha / 2));
    // 2π(1 − cos x) written as 4π sin²(x/2) to keep small caps exact.
    expect(area).toBeGreaterThanOrEqual(4 * Math.PI * Math.sin(thetaInner / 2) ** 2 * (1 - 1e-12));
    expect(area).toBeLessThanOrEqual(4 * Math.PI * Math.sin(theta / 2) ** 2 * (1 + 1e-12));
  });

  it('agrees with GeographicLib for random polygons from a metre to thousands of kilometres across', () => {
    const lat = fc.double({ min: -89, max: 89, noNaN: true });
    const lon = fc.double({ min: -180, max: 180, noNaN: true });
    const size = fc.constantFrom(0.001, 0.1, 10, 300, 3000);
    fc.assert(fc.property(lat, lon, size, fc.integer({ min: 3, max: 40 }), fc.integer(), (cLat, cLon, km, n, seed) => {
      let s = seed >>> 0 || 1;
      const next = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
      const radii = Array.from({ length: n }, () => km * (0.3 + 0.7 * next()));
      const bearings = Array.from({ length: n }, (_, k) => ((k + 0.8 * next()) * 360) / n - 180);
      const ring = starPolygon(cLat, cLon, radii, bearings);
      const ours = polygonAreaKm2(degreesToUnitVectors(ring.lat, ring.lon));
      const reference = referenceKm2(ring.lat, ring.lon);
      expect(ours).toBeGreaterThan(0);
      // Agreement to 1e-9 relative, plus 1e-10 km² for the metre-sized ones, where GeographicLib's
      // sum of edge terms loses digits (see the planar check below for those).
      expect(Math.abs(ours - reference)).toBeLessThanOrEqual(1e-9 * reference + 1e-10);
    }), { numRuns: 400, seed: 41 });
  });

  // At the metre scale GeographicLib's sum of edge terms loses relative precision, so there the
  // reference is the plane: in the azimuthal equidistant projection about the centre the vertices
  // are (r sin β, r cos β), and the shoelace area differs from the spherical one by a relative
  // O((d/R)²) ≈ 1e-13 (the sphere is flat at that scale; common practice). What remains is the
  // rounding of the vertices' degrees, ~2 nm, hence 1e-8 relative on a square metre.
  it('agrees with the planar shoelace area for polygons a metre across', () => {
    const lat = fc.double({ min: -89, max: 89, noNaN: true });
    const lon = fc.double({ min: -180, max: 180, noNaN: true });
    fc.assert(fc.property(lat, lon, fc.integer({ min: 3, max: 20 }), fc.integer(), (cLat, cLon, n, seed) => {
      let s = seed >>> 0 || 1;
      const next = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
      const radii = Array.from({ length: n }, () => 0.001 * (0.3 + 0.7 * next()));
      const bearings = Array.from({ length: n }, (_, k) => ((k + 0.8 * next()) * 360) / n - 180).sort((a, b) => a - b);
      const ring = starPolygon(cLat, cLon, radii, bearings);
      let twice = 0;
      for (let k = 0; k < n; k++) {
        const j = (k + 1) % n;
        const [xk, yk] = [radii[k] * Math.sin(-bearings[k] * RAD), radii[k] * Math.cos(-bearings[k] * RAD)];
        const [xj, yj] = [radii[j] * Math.sin(-bearings[j] * RAD), radii[j] * Math.cos(-bearings[j] * RAD)];
        twice += xk * yj - xj * yk;
      }
      const planar = twice / 2; // x east, y north: the vertices at decreasing bearings run counter-clockwise
      expect(Math.abs(polygonAreaKm2(degreesToUnitVectors(ring.lat, ring.lon)) - planar)).toBeLessThanOrEqual(1e-8 * planar);
    }), { numRuns: 300, seed: 43 });
  });

  it('agrees with GeographicLib for rings around a pole and across the antimeridian', () => {
    const rings = [
      { lat: [80, 80, 80, 80], lon: [-180, -90, 0, 90] },
      { lat: [-70, -75, -80, -72], lon: [10, -80, 170, 100] },
      { lat: [-10, -10, 10, 10], lon: [170, -170, -170, 170] },
    ];
    for (const r of rings) {
      const ours = polygonAreaKm2(degreesToUnitVectors(Float64Array.from(r.lat), Float64Array.from(r.lon)));
      const reference = referenceKm2(r.lat, r.lon);
      expect(Math.abs(ours - reference)).toBeLessThanOrEqual(1e-9 * Math.abs(reference));
    }
  });

  it('gives minus the other side for a counter-clockwise ring holding more than a hemisphere, as GeographicLib', () => {
    // The equator-ward ring at 30°S traversed eastward holds everything north of it on its left.
    const lat = new Float64Array(36).fill(-30);
    const lon = Float64Array.from({ length: 36 }, (_, k) => -180 + 10 * k);
    const ours = polygonAreaKm2(degreesToUnitVectors(lat, lon));
    expect(ours).toBeLessThan(0);
    expect(Math.abs(ours - referenceKm2(lat, lon))).toBeLessThanOrEqual(1e-9 * Math.abs(ours));
  });

  it('does not change when the ring starts at another vertex (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 3, max: 30 }), fc.nat(), fc.double({ min: 0.01, max: 40, noNaN: true }), (n, shift, radiusDeg) => {
      const lat = Float64Array.from({ length: n }, (_, k) => 20 + radiusDeg * Math.sin((2 * Math.PI * k) / n) * (1 + (k % 3) / 10));
      const lon = Float64Array.from({ length: n }, (_, k) => 175 + radiusDeg * Math.cos((2 * Math.PI * k) / n));
      const ring = Uint32Array.from({ length: n }, (_, k) => (k + shift) % n);
      const a = polygonAreaSr(degreesToUnitVectors(lat, lon));
      expect(Math.abs(polygonAreaSr(degreesToUnitVectors(lat, lon), ring) - a)).toBeLessThanOrEqual(1e-14 * Math.abs(a) + 1e-20);
    }), { numRuns: 300, seed: 42 });
  });

  it('changes sign and nothing else when the ring is reversed, and ignores a repeated closing vertex', () => {
    const lat = Float64Array.of(-5, -4, 3, 6, 1), lon = Float64Array.of(10, 22, 25, 14, 8);
    const a = polygonAreaSr(degreesToUnitVectors(lat, lon));
    expect(polygonAreaSr(degreesToUnitVectors(lat, lon), Uint32Array.of(4, 3, 2, 1, 0))).toBeCloseTo(-a, 15);
    expect(polygonAreaSr(degreesToUnitVectors(lat, lon), Uint32Array.of(0, 1, 2, 3, 4, 0))).toBeCloseTo(a, 15);
  });

  it('is zero for fewer than three vertices', () => {
    expect(polygonAreaSr(degreesToUnitVectors(Float64Array.of(1, 2), Float64Array.of(1, 2)))).toBe(0);
  });
});
