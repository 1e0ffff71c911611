/**
 * Spherical linear interpolation (Shoemake 1985, "Animating rotation with quaternion
 * curves", SIGGRAPH) from `a` (t = 0) to `b` (t = 1) along the shorter arc: when a·b < 0, −b
 * stands for b, so the rotation turns through the smaller angle.
 *
 * Split in two so that what depends only on the end points — the arc: b on a's side, the
 * angle θ between them and sin θ — can be worked out once per pair (each tabulated interval of
 * a rotation model) and reused for every t; interpolating along it then costs two sines.
 */
import { normalizeQuaternionInto, type Quaternion } from './quaternion';

/** Below this angle between two quaternions (radians on the 3-sphere) slerp falls back to a
 * normalised linear blend: the error is O(θ²), far below double precision. */
const SLERP_LINEAR_BELOW = 1e-9;

/** Numbers per arc: b on a's side (w, x, y, z), θ, sin θ. */
export const SLERP_ARC_SIZE = 6;

/** Writes the arc from `a` to `b` into out[offset … offset + SLERP_ARC_SIZE − 1]. */
export function slerpArcInto(a: ArrayLike<number>, b: ArrayLike<number>, out: Float64Array, offset = 0): Float64Array {
  const aw = a[0], ax = a[1], ay = a[2], az = a[3];
  const sign = aw * b[0] + ax * b[1] + ay * b[2] + az * b[3] < 0 ? -1 : 1;
  const bw = sign * b[0], bx = sign * b[1], by = sign * b[2], bz = sign * b[3];
  // Angle between a and b on the 3-sphere, from chord lengths: exact near 0 where acos is not.
  const theta = 2 * Math.atan2(
    Math.hypot(aw - bw, ax - bx, ay - by, az - bz),
    Math.hypot(aw + bw, ax + bx, ay + by, az + bz),
  );
  out[offset] = bw;
  out[offset + 1] = bx;
  out[offset + 2] = by;
  out[offset + 3] = bz;
  out[offset + 4] = theta;
  out[offset + 5] = Math.sin(theta);
  return out;
}

/** Slerp at `t` from `a` along the arc at arcs[offset …] (made by slerpArcInto from `a`). */
export function slerpAlongArcInto(a: ArrayLike<number>, arcs: Float64Array, offset: number, t: number, out: Quaternion): Quaternion {
  const aw = a[0], ax = a[1], ay = a[2], az = a[3];
  const bw = arcs[offset], bx = arcs[offset + 1], by = arcs[offset + 2], bz = arcs[offset + 3];
  const theta = arcs[offset + 4];
  let ka: number, kb: number;
  if (theta < SLERP_LINEAR_BELOW) {
    ka = 1 - t;
    kb = t;
  } else {
    const s = arcs[offset + 5];
    ka = Math.sin((1 - t) * theta) / s;
    kb = Math.sin(t * theta) / s;
  }
  out[0] = ka * aw + kb * bw;
  out[1] = ka * ax + kb * bx;
  out[2] = ka * ay + kb * by;
  out[3] = ka * az + kb * bz;
  return theta < SLERP_LINEAR_BELOW ? normalizeQuaternionInto(out, out) : out;
}
