// Independent reference for rotation tests: rotation matrices by Rodrigues' rotation formula
// (O. Rodrigues 1840, J. Math. Pures Appl. 5, 380–440): R = I + sin θ K + (1 − cos θ) K², with K
// the cross-product matrix of the unit axis. Nothing here uses quaternions.
export type Vec3 = [number, number, number];
/** Row-major 3×3. */
export type Mat3 = number[];

const RAD = Math.PI / 180;

export function unit(latDeg: number, lonDeg: number): Vec3 {
  const p = latDeg * RAD, l = lonDeg * RAD;
  return [Math.cos(p) * Math.cos(l), Math.cos(p) * Math.sin(l), Math.sin(p)];
}

export function rodrigues(axis: Vec3, angleRad: number): Mat3 {
  const [x, y, z] = axis, s = Math.sin(angleRad), c = 1 - Math.cos(angleRad);
  const k = [0, -z, y, z, 0, -x, -y, x, 0];
  const k2 = [-(y * y + z * z), x * y, x * z, x * y, -(x * x + z * z), y * z, x * z, y * z, -(x * x + y * y)];
  return k.map((kij, i) => (i % 4 === 0 ? 1 : 0) + s * kij + c * k2[i]);
}

/** Matrix of a rotation given as pole (degrees) and angle (degrees, right-hand rule). */
export function poleMatrix(latDeg: number, lonDeg: number, angleDeg: number): Mat3 {
  return rodrigues(unit(latDeg, lonDeg), angleDeg * RAD);
}

export function apply(m: Mat3, v: ArrayLike<number>): Vec3 {
  return [0, 1, 2].map((r) => m[3 * r] * v[0] + m[3 * r + 1] * v[1] + m[3 * r + 2] * v[2]) as Vec3;
}

export function matMul(a: Mat3, b: Mat3): Mat3 {
  return Array.from({ length: 9 }, (_, i) => {
    const r = Math.floor(i / 3), c = i % 3;
    return a[3 * r] * b[c] + a[3 * r + 1] * b[3 + c] + a[3 * r + 2] * b[6 + c];
  });
}

export function transpose(m: Mat3): Mat3 {
  return [m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]];
}

/** Axis and angle of a rotation matrix: cos θ = (trace − 1)/2, axis from the skew part
 * (standard result, e.g. Goldstein, Classical Mechanics, §4.7). Valid for 0 < θ < π. */
export function axisAngleOfMatrix(m: Mat3): { axis: Vec3; angle: number } {
  const sx = m[7] - m[5], sy = m[2] - m[6], sz = m[3] - m[1];
  const s = Math.hypot(sx, sy, sz); // = 2 sin θ
  const angle = Math.atan2(s / 2, (m[0] + m[4] + m[8] - 1) / 2);
  return { axis: [sx / s, sy / s, sz / s], angle };
}

/**
 * The rotation a fraction t of the way from A to B along the geodesic of SO(3):
 * exp(t·log(B·Aᵀ))·A — turn by t times the angle of the shortest rotation D = B·Aᵀ about its
 * axis, after A. It is what slerp of the corresponding unit quaternions gives (Shoemake 1985).
 */
export function geodesicBetween(a: Mat3, b: Mat3, t: number): Mat3 {
  const d = axisAngleOfMatrix(matMul(b, transpose(a)));
  if (!(d.angle > 1e-12)) return a;
  return matMul(rodrigues(d.axis, t * d.angle), a);
}

/** Great-circle angle between two unit vectors, degrees. */
export function angleBetweenDeg(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const cx = a[1] * b[2] - a[2] * b[1], cy = a[2] * b[0] - a[0] * b[2], cz = a[0] * b[1] - a[1] * b[0];
  return Math.atan2(Math.hypot(cx, cy, cz), a[0] * b[0] + a[1] * b[1] + a[2] * b[2]) / RAD;
}
