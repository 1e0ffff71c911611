import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { OPEN_HEMISPHERE_MARGIN, smallestEnclosingCap } from '../../src/sphere/smallest-enclosing-cap';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';

type V = [number, number, number];
const dot = (a: V, b: V) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const sub = (a: V, b: V): V => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const cross = (a: V, b: V): V => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const unit = (a: V): V => { const l = Math.hypot(...a); return [a[0] / l, a[1] / l, a[2] / l]; };

// Reference: brute force over the definition. The smallest cap holding points that fit in an
// open hemisphere has two or three of them on its rim (as the smallest enclosing circle in the
// plane; Welzl 1991), so it is the smallest of the caps through every pair (centred on their
// midpoint) and every triple (both caps through the three) that holds all the points. If no
// such cap smaller than a hemisphere exists, the points fit in no open hemisphere. O(n⁴).
function bruteForceCosRadius(points: V[]): number | null {
  const candidates: V[] = [];
  for (let i = 0; i < points.length; i++) {
    for (let j = i + 1; j < points.length; j++) {
      const mid: V = [points[i][0] + points[j][0], points[i][1] + points[j][1], points[i][2] + points[j][2]];
      if (Math.hypot(...mid) > 1e-9) candidates.push(unit(mid));
      for (let k = j + 1; k < points.length; k++) {
        const normal = cross(sub(points[j], points[i]), sub(points[k], points[i]));
        if (Math.hypot(...normal) < 1e-12) continue;
        candidates.push(unit(normal), unit([-normal[0], -normal[1], -normal[2]]));
      }
    }
  }
  let best: number | null = null;
  for (const c of candidates) {
    const cosR = Math.min(...points.map((p) => dot(c, p)));
    if (cosR > OPEN_HEMISPHERE_MARGIN && (best === null || cosR > best)) best = cosR;
  }
  return best;
}

const vectors = (pos: [number, number][]) =>
  degreesToUnitVectors(Float64Array.from(pos, (p) => p[0]), Float64Array.from(pos, (p) => p[1]));

describe('smallest enclosing cap', () => {
  it('finds the same cap as a brute-force search over pairs and triples, or none when there is none (property)', () => {
    const position = fc.tuple(fc.double({ min: -90, max: 90, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }));
    const clustered = fc.tuple(fc.double({ min: 0, max: 70, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }));
    fc.assert(fc.property(fc.array(fc.oneof(position, clustered, clustered), { minLength: 1, maxLength: 12 }), (pos) => {
      const xyz = vectors(pos);
      const points = pos.map((_, i) => [xyz[3 * i], xyz[3 * i + 1], xyz[3 * i + 2]] as V);
      const cap = smallestEnclosingCap(xyz);
      const reference = pos.length === 1 ? 1 : bruteForceCosRadius(points);
      if (reference === null) {
        expect(cap).toBeNull();
      } else {
        expect(cap).not.toBeNull();
        expect(Math.abs(cap![3] - reference)).toBeLessThan(1e-12);
        for (const p of points) expect(dot([cap![0], cap![1], cap![2]], p)).toBeGreaterThanOrEqual(cap![3] - 1e-13);
      }
    }), { numRuns: 400, seed: 51 });
  });

  it('is centred on the pole, 10° wide, for points on the 80th parallel', () => {
    const cap = smallestEnclosingCap(vectors([[80, 0], [80, 120], [80, -120], [85, 40]]))!;
    expect(cap[2]).toBeCloseTo(1, 14);
    expect(Math.acos(cap[3]) * (180 / Math.PI)).toBeCloseTo(10, 10);
  });

  it('reports none for antipodal points, and for points spread over the globe, whatever the seed', () => {
    expect(smallestEnclosingCap(vectors([[10, 20], [-10, -160]]))).toBeNull();
    const octahedron = vectors([[0, 0], [0, 90], [0, 180], [0, -90], [90, 0], [-90, 0]]);
    for (const seed of [1, 2, 3, 99]) expect(smallestEnclosingCap(octahedron, seed)).toBeNull();
  });

  it('reports none for the empty set', () => {
    expect(smallestEnclosingCap(new Float64Array(0))).toBeNull();
  });
});
