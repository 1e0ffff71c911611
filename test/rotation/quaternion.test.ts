import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  axisAngleFromQuaternionInto,
  createQuaternion,
  identityInto,
  multiplyQuaternionsInto,
  normalizeQuaternionInto,
  poleFromQuaternion,
  quaternionFromAxisAngleInto,
  quaternionFromPole,
  rotateVectorInto,
} from '../../src/rotation/quaternion';
import { SLERP_ARC_SIZE, slerpAlongArcInto, slerpArcInto } from '../../src/rotation/slerp';

// Independent reference: rotation matrices by Rodrigues' formula (see ./rodrigues for the
// citation). Nothing in it uses quaternions.
import { apply, axisAngleOfMatrix, geodesicBetween, matMul, rodrigues, transpose, unit } from './rodrigues';

const RAD = Math.PI / 180;

function expectVecClose(actual: ArrayLike<number>, expected: ArrayLike<number>, tol = 1e-12): void {
  for (let i = 0; i < 3; i++) expect(Math.abs(actual[i] - expected[i])).toBeLessThan(tol);
}

/** Same rotation: q and −q are equal rotations, so compare up to sign. */
function expectSameRotation(a: ArrayLike<number>, b: ArrayLike<number>, tol = 1e-12): void {
  const sign = a[0] * b[0] + a[1] * b[1] + a[2] * b[2] + a[3] * b[3] < 0 ? -1 : 1;
  for (let i = 0; i < 4; i++) expect(Math.abs(a[i] - sign * b[i])).toBeLessThan(tol);
}

// Degrees on a 1e-6° lattice: fc.double draws mostly tiny magnitudes, which would leave most
// rotations near the identity and the checks weak.
const degrees = (min: number, max: number) => fc.integer({ min: min * 1e6, max: max * 1e6 }).map((i) => i / 1e6);
const lat = degrees(-90, 90);
const lon = degrees(-180, 180);
const angle = degrees(-360, 360);
const pole = fc.record({ lat, lon, angle });
const point = fc.record({ lat, lon });

/** Slerp from `a` to `b` at `t` through the two steps the rotation model takes: the arc once, then a point along it. */
function slerp(a: ArrayLike<number>, b: ArrayLike<number>, t: number): Float64Array {
  return slerpAlongArcInto(a, slerpArcInto(a, b, new Float64Array(SLERP_ARC_SIZE)), 0, t, createQuaternion());
}

describe('quaternion rotations agree with an independent rotation matrix', () => {
  it('rotates any unit vector as the Rodrigues matrix of the same pole and angle does', () => {
    fc.assert(fc.property(pole, point, (r, p) => {
      const q = quaternionFromPole(r.lat, r.lon, r.angle);
      const v = unit(p.lat, p.lon);
      expectVecClose(rotateVectorInto(q, v, new Float64Array(3)), apply(rodrigues(unit(r.lat, r.lon), r.angle * RAD), v));
    }));
  });

  it('moves (0°, 0°) to (0°, 90°E) under a 90° rotation about the north pole (right-hand rule)', () => {
    const out = rotateVectorInto(quaternionFromPole(90, 0, 90), unit(0, 0), new Float64Array(3));
    expectVecClose(out, [0, 1, 0]);
  });

  it('leaves a point on the rotation pole where it is', () => {
    fc.assert(fc.property(pole, (r) => {
      const v = unit(r.lat, r.lon);
      expectVecClose(rotateVectorInto(quaternionFromPole(r.lat, r.lon, r.angle), v, new Float64Array(3)), v);
    }));
  });

  it('turns the north pole into the south pole and 90°E into 90°W under 180° about (0°, 0°)', () => {
    const q = quaternionFromPole(0, 0, 180);
    expectVecClose(rotateVectorInto(q, [0, 0, 1], new Float64Array(3)), [0, 0, -1]);
    expectVecClose(rotateVectorInto(q, unit(0, 90), new Float64Array(3)), unit(0, -90));
    expectVecClose(rotateVectorInto(q, unit(0, 0), new Float64Array(3)), unit(0, 0));
  });

  it('composes as matrices do: a∘b rotates by b first, then by a', () => {
    fc.assert(fc.property(pole, pole, point, (ra, rb, p) => {
      const ab = multiplyQuaternionsInto(quaternionFromPole(ra.lat, ra.lon, ra.angle), quaternionFromPole(rb.lat, rb.lon, rb.angle), createQuaternion());
      const m = matMul(rodrigues(unit(ra.lat, ra.lon), ra.angle * RAD), rodrigues(unit(rb.lat, rb.lon), rb.angle * RAD));
      const v = unit(p.lat, p.lon);
      expectVecClose(rotateVectorInto(ab, v, new Float64Array(3)), apply(m, v));
    }));
  });

  it('is associative under composition', () => {
    fc.assert(fc.property(pole, pole, pole, (ra, rb, rc) => {
      const [a, b, c] = [ra, rb, rc].map((r) => quaternionFromPole(r.lat, r.lon, r.angle));
      const left = multiplyQuaternionsInto(multiplyQuaternionsInto(a, b, createQuaternion()), c, createQuaternion());
      const right = multiplyQuaternionsInto(a, multiplyQuaternionsInto(b, c, createQuaternion()), createQuaternion());
      expectSameRotation(left, right);
    }));
  });

  it('writes correct results when the output is also an input', () => {
    const a = quaternionFromPole(10, 20, 30), b = quaternionFromPole(-40, 50, 60);
    const expected = multiplyQuaternionsInto(a, b, createQuaternion());
    expectSameRotation(multiplyQuaternionsInto(a, b, a), expected);
    const v = new Float64Array(unit(5, 6));
    const w = rotateVectorInto(b, v, new Float64Array(3));
    expectVecClose(rotateVectorInto(b, v, v), w);
  });
});

describe('pole and angle round trips', () => {
  it('gives back the pole and angle it was built from, in canonical form', () => {
    fc.assert(fc.property(lat, lon, degrees(1e-6, 179.999), (la, lo, an) => {
      const r = poleFromQuaternion(quaternionFromPole(la, lo, an));
      expect(Math.abs(r.angle - an)).toBeLessThan(1e-9);
      expectVecClose(unit(r.lat, r.lon), unit(la, lo), 1e-9);
    }));
  });

  it('turns a negative angle into a positive one about the antipodal pole', () => {
    const r = poleFromQuaternion(quaternionFromPole(30, 40, -25));
    expect(r.angle).toBeCloseTo(25, 12);
    expect(r.lat).toBeCloseTo(-30, 12);
    expect(r.lon).toBeCloseTo(-140, 12);
  });

  it('keeps every canonical angle within [0°, 180°] and longitude within (−180°, 180°]', () => {
    fc.assert(fc.property(pole, (p) => {
      const r = poleFromQuaternion(quaternionFromPole(p.lat, p.lon, p.angle));
      expect(r.angle).toBeGreaterThanOrEqual(0);
      expect(r.angle).toBeLessThanOrEqual(180);
      expect(r.lon).toBeGreaterThan(-180);
      expect(r.lon).toBeLessThanOrEqual(180);
      expectSameRotation(quaternionFromPole(r.lat, r.lon, r.angle), quaternionFromPole(p.lat, p.lon, p.angle), 1e-9);
    }));
  });

  it('puts the pole of an exact half-turn in the northern hemisphere', () => {
    const r = poleFromQuaternion(new Float64Array([0, 0.6, 0, -0.8]));
    expect(r.angle).toBe(180);
    expect(r.lat).toBeCloseTo(Math.asin(0.8) / RAD, 12);
    expect(r.lon).toBeCloseTo(180, 12);
  });

  it('describes the identity as no rotation about the north pole', () => {
    expect(poleFromQuaternion(createQuaternion())).toEqual({ lat: 90, lon: 0, angle: 0 });
    expect(Array.from(identityInto(new Float64Array(4)))).toEqual([1, 0, 0, 0]);
    const a = axisAngleFromQuaternionInto(quaternionFromAxisAngleInto(0, 1, 0, 0, createQuaternion()), new Float64Array(4));
    expect(Array.from(a)).toEqual([0, 0, 1, 0]);
  });

  it('recovers axis and angle in radians from the axis-angle constructor', () => {
    const s = Math.SQRT1_2;
    const a = axisAngleFromQuaternionInto(quaternionFromAxisAngleInto(s, 0, -s, 2, createQuaternion()), new Float64Array(4));
    expectVecClose(a, [s, 0, -s], 1e-15);
    expect(a[3]).toBeCloseTo(2, 15);
  });
});

describe('normalising and interpolating', () => {
  it('rescales a drifted quaternion to unit length without changing the rotation', () => {
    const q = quaternionFromPole(12, 34, 56);
    const drifted = q.map((c) => c * 1.001);
    const n = normalizeQuaternionInto(drifted, createQuaternion());
    expect(Math.hypot(...n)).toBeCloseTo(1, 15);
    expectSameRotation(n, q, 1e-15);
  });

  it('starts at the first rotation and ends at the second', () => {
    fc.assert(fc.property(pole, pole, (ra, rb) => {
      const a = quaternionFromPole(ra.lat, ra.lon, ra.angle), b = quaternionFromPole(rb.lat, rb.lon, rb.angle);
      expectSameRotation(slerp(a, b, 0), a, 1e-12);
      expectSameRotation(slerp(a, b, 1), b, 1e-12);
    }));
  });

  it('turns halfway about a shared pole to half the angle', () => {
    const a = quaternionFromPole(20, 30, 10), b = quaternionFromPole(20, 30, 50);
    expectSameRotation(slerp(a, b, 0.5), quaternionFromPole(20, 30, 30));
  });

  it('takes the shorter way: 350° is reached by turning −10°, and −q interpolates as q', () => {
    const a = createQuaternion(), b = quaternionFromPole(90, 0, 350);
    expectSameRotation(slerp(a, b, 0.5), quaternionFromPole(90, 0, -5));
    const negB = b.map((c) => -c);
    expectSameRotation(slerp(a, negB, 0.3), slerp(a, b, 0.3));
  });

  it('matches the matrix geodesic exp(t·log(B·Aᵀ))·A between two rotations', () => {
    fc.assert(fc.property(pole, pole, degrees(0, 1), point, (ra, rb, t, p) => {
      const ma = rodrigues(unit(ra.lat, ra.lon), ra.angle * RAD), mb = rodrigues(unit(rb.lat, rb.lon), rb.angle * RAD);
      // Away from a half-turn between A and B, where the shortest way is not unique.
      fc.pre(axisAngleOfMatrix(matMul(mb, transpose(ma))).angle < Math.PI - 1e-6);
      const expected = apply(geodesicBetween(ma, mb, t), unit(p.lat, p.lon));
      const q = slerp(quaternionFromPole(ra.lat, ra.lon, ra.angle), quaternionFromPole(rb.lat, rb.lon, rb.angle), t);
      expectVecClose(rotateVectorInto(q, unit(p.lat, p.lon), new Float64Array(3)), expected, 1e-9);
    }));
  });

  it('follows the matrix geodesic at every t along one arc worked out beforehand', () => {
    fc.assert(fc.property(pole, pole, fc.array(degrees(0, 1), { minLength: 1, maxLength: 5 }), point, (ra, rb, ts, p) => {
      const ma = rodrigues(unit(ra.lat, ra.lon), ra.angle * RAD), mb = rodrigues(unit(rb.lat, rb.lon), rb.angle * RAD);
      fc.pre(axisAngleOfMatrix(matMul(mb, transpose(ma))).angle < Math.PI - 1e-6);
      const a = quaternionFromPole(ra.lat, ra.lon, ra.angle);
      const arcs = slerpArcInto(a, quaternionFromPole(rb.lat, rb.lon, rb.angle), new Float64Array(2 * SLERP_ARC_SIZE), SLERP_ARC_SIZE);
      for (const t of ts) {
        const q = slerpAlongArcInto(a, arcs, SLERP_ARC_SIZE, t, createQuaternion());
        expectVecClose(rotateVectorInto(q, unit(p.lat, p.lon), new Float64Array(3)), apply(geodesicBetween(ma, mb, t), unit(p.lat, p.lon)), 1e-9);
      }
    }));
  });

  it('interpolates between nearly equal rotations without losing unit length', () => {
    const a = quaternionFromPole(10, 10, 40), b = quaternionFromPole(10, 10, 40 + 1e-10);
    const q = slerp(a, b, 0.5);
    expect(Math.hypot(...q)).toBeCloseTo(1, 15);
    expectSameRotation(q, a, 1e-12);
  });
});
