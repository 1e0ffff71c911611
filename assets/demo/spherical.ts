/**
 * Small spherical helpers for the demo generator: positions as unit vectors (x towards
 * 0°N 0°E, z towards the north pole), degrees at the edges.
 */
import { DEGREES, RADIANS } from '../../src/sphere/earth';

export type Vec3 = Float64Array;

export function vectorFromLatLonInto(latDeg: number, lonDeg: number, out: Vec3): Vec3 {
  const phi = latDeg * RADIANS, lambda = lonDeg * RADIANS, c = Math.cos(phi);
  out[0] = c * Math.cos(lambda);
  out[1] = c * Math.sin(lambda);
  out[2] = Math.sin(phi);
  return out;
}

export function latOfVector(v: ArrayLike<number>): number {
  return Math.atan2(v[2], Math.hypot(v[0], v[1])) * DEGREES;
}

/** Longitude in [−180, 180]. */
export function lonOfVector(v: ArrayLike<number>): number {
  return Math.atan2(v[1], v[0]) * DEGREES;
}

/**
 * The point reached from `centre` by going `distanceDeg` along the great circle that leaves it
 * at `bearingDeg` (clockwise from north): p = c·cos δ + (n·cos β + e·sin β)·sin δ, with n and e
 * the local north and east unit vectors (standard spherical geometry).
 */
export function destinationInto(
  centre: ArrayLike<number>, bearingDeg: number, distanceDeg: number, out: Vec3,
): Vec3 {
  const [x, y, z] = [centre[0], centre[1], centre[2]];
  const h = Math.hypot(x, y); // cos(latitude) of the centre; centres are never at a pole here
  const east = [-y / h, x / h, 0];
  const north = [-z * x / h, -z * y / h, h];
  const beta = bearingDeg * RADIANS, delta = distanceDeg * RADIANS;
  const cb = Math.cos(beta) * Math.sin(delta), sb = Math.sin(beta) * Math.sin(delta), cd = Math.cos(delta);
  for (let i = 0; i < 3; i++) out[i] = centre[i] * cd + north[i] * cb + east[i] * sb;
  return out;
}

/** Great-circle angle between two unit vectors, degrees (atan2 form: exact at all angles). */
export function angleBetween(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const cx = a[1] * b[2] - a[2] * b[1], cy = a[2] * b[0] - a[0] * b[2], cz = a[0] * b[1] - a[1] * b[0];
  return Math.atan2(Math.hypot(cx, cy, cz), a[0] * b[0] + a[1] * b[1] + a[2] * b[2]) * DEGREES;
}
