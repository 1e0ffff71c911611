/**
 * Unit quaternions for rotations of the sphere, stored as Float64Array(4) in the order
 * [w, x, y, z] (w the scalar part). A rotation by angle θ about the unit axis n is
 * q = (cos θ/2, sin θ/2 · n) (Hamilton's convention; see Kuipers 1999, Quaternions and
 * Rotation Sequences, ch. 5). q and −q are the same rotation.
 *
 * Angles are positive anticlockwise seen from above the axis (right-hand rule). Radians and
 * unit vectors inside; degrees only in `quaternionFromPole` / `poleFromQuaternion`.
 * Functions taking `out` write into it and return it, allocate nothing, and allow `out` to be
 * one of the inputs.
 */
import { DEGREES, RADIANS } from '../sphere/earth';

export type Quaternion = Float64Array;

/** A rotation given as an Euler pole and an angle, all in degrees. */
export interface RotationPole {
  readonly lat: number;
  readonly lon: number;
  /** Anticlockwise seen from above the pole (right-hand rule). */
  readonly angle: number;
}

/** A new identity rotation. */
export function createQuaternion(): Quaternion {
  return identityInto(new Float64Array(4));
}

export function identityInto(out: Quaternion): Quaternion {
  out[0] = 1;
  out[1] = 0;
  out[2] = 0;
  out[3] = 0;
  return out;
}

/** Rotation by `angle` radians about the unit axis (x, y, z). */
export function quaternionFromAxisAngleInto(
  x: number, y: number, z: number, angle: number, out: Quaternion,
): Quaternion {
  const half = angle / 2;
  const s = Math.sin(half);
  out[0] = Math.cos(half);
  out[1] = s * x;
  out[2] = s * y;
  out[3] = s * z;
  return out;
}

/**
 * Inverse of `quaternionFromAxisAngleInto`, in canonical form: angle in [0, π] radians and
 * the axis on the side that makes it so. Writes [x, y, z, angle] into `out`. The identity has
 * no axis; it is given the north pole (0, 0, 1) with angle 0. At exactly π both axes qualify;
 * the one with z > 0 is chosen (then y > 0, then x > 0).
 */
export function axisAngleFromQuaternionInto(q: ArrayLike<number>, out: Float64Array): Float64Array {
  let w = q[0], x = q[1], y = q[2], z = q[3];
  if (w < 0 || (w === 0 && (z < 0 || (z === 0 && (y < 0 || (y === 0 && x < 0)))))) {
    w = -w; x = -x; y = -y; z = -z;
  }
  const s = Math.sqrt(x * x + y * y + z * z);
  if (s === 0) {
    out[0] = 0; out[1] = 0; out[2] = 1; out[3] = 0;
    return out;
  }
  out[0] = x / s;
  out[1] = y / s;
  out[2] = z / s;
  // atan2 keeps full precision for small and near-π angles alike, unlike acos(w).
  out[3] = 2 * Math.atan2(s, w);
  return out;
}

/** Rotation about the pole (latitude, longitude in degrees) by `angle` degrees. */
export function quaternionFromPole(
  lat: number, lon: number, angle: number, out: Quaternion = new Float64Array(4),
): Quaternion {
  const phi = lat * RADIANS, lambda = lon * RADIANS, cosPhi = Math.cos(phi);
  return quaternionFromAxisAngleInto(
    cosPhi * Math.cos(lambda), cosPhi * Math.sin(lambda), Math.sin(phi), angle * RADIANS, out,
  );
}

/**
 * Inverse of `quaternionFromPole`, in canonical form: angle in [0, 180] degrees, the pole in
 * the hemisphere that makes it so, longitude in (−180, 180]. The identity is (90, 0, 0).
 */
export function poleFromQuaternion(q: ArrayLike<number>): RotationPole {
  const a = axisAngleFromQuaternionInto(q, new Float64Array(4));
  const lon = Math.atan2(a[1], a[0]) * DEGREES;
  return {
    lat: Math.atan2(a[2], Math.hypot(a[0], a[1])) * DEGREES,
    lon: lon === -180 ? 180 : lon,
    angle: a[3] * DEGREES,
  };
}

/** The composition a∘b: rotate by `b` first, then by `a` (Hamilton product a·b). */
export function multiplyQuaternionsInto(
  a: ArrayLike<number>, b: ArrayLike<number>, out: Quaternion,
): Quaternion {
  const aw = a[0], ax = a[1], ay = a[2], az = a[3];
  const bw = b[0], bx = b[1], by = b[2], bz = b[3];
  out[0] = aw * bw - ax * bx - ay * by - az * bz;
  out[1] = aw * bx + ax * bw + ay * bz - az * by;
  out[2] = aw * by - ax * bz + ay * bw + az * bx;
  out[3] = aw * bz + ax * by - ay * bx + az * bw;
  return out;
}

/** Rescales to unit length, removing the drift that long chains of products accumulate. */
export function normalizeQuaternionInto(q: ArrayLike<number>, out: Quaternion): Quaternion {
  const n = Math.hypot(q[0], q[1], q[2], q[3]);
  out[0] = q[0] / n;
  out[1] = q[1] / n;
  out[2] = q[2] / n;
  out[3] = q[3] / n;
  return out;
}

/**
 * Rotates the vector v = (x, y, z) by q, i.e. q·v·q*, written into `out` (may be `v`).
 * Uses the expansion v' = v + w·t + u×t with u = (qx, qy, qz) and t = 2 u×v, which follows
 * from expanding the product (common practice in graphics code).
 */
export function rotateVectorInto(
  q: ArrayLike<number>, v: ArrayLike<number>, out: Float64Array,
): Float64Array {
  const w = q[0], ux = q[1], uy = q[2], uz = q[3];
  const vx = v[0], vy = v[1], vz = v[2];
  const tx = 2 * (uy * vz - uz * vy);
  const ty = 2 * (uz * vx - ux * vz);
  const tz = 2 * (ux * vy - uy * vx);
  out[0] = vx + w * tx + (uy * tz - uz * ty);
  out[1] = vy + w * ty + (uz * tx - ux * tz);
  out[2] = vz + w * tz + (ux * ty - uy * tx);
  return out;
}
