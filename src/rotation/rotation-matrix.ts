/**
 * 3×3 rotation matrices, row-major, from unit quaternions: the matrix of v ↦ q·v·q*
 * (Shoemake 1985, "Animating rotation with quaternion curves", SIGGRAPH; Kuipers 1999, §5.14).
 * Turning many points by one rotation costs 9 multiplications each this way, fewer than the
 * quaternion sandwich.
 */

/** Writes the matrix of the unit quaternion `q` into out[offset … offset + 8] (row-major). */
export function rotationMatrixFromQuaternionInto(q: ArrayLike<number>, out: Float64Array, offset = 0): Float64Array {
  const w = q[0], x = q[1], y = q[2], z = q[3];
  const xx = x * x, yy = y * y, zz = z * z, xy = x * y, xz = x * z, yz = y * z, wx = w * x, wy = w * y, wz = w * z;
  out[offset] = 1 - 2 * (yy + zz);
  out[offset + 1] = 2 * (xy - wz);
  out[offset + 2] = 2 * (xz + wy);
  out[offset + 3] = 2 * (xy + wz);
  out[offset + 4] = 1 - 2 * (xx + zz);
  out[offset + 5] = 2 * (yz - wx);
  out[offset + 6] = 2 * (xz - wy);
  out[offset + 7] = 2 * (yz + wx);
  out[offset + 8] = 1 - 2 * (xx + yy);
  return out;
}
