/**
 * Spherical convex hull. It exists only for points inside an open hemisphere; the centre c of
 * their smallest enclosing cap then has c·p > 0 for all of them, and the gnomonic projection
 * centred on c maps great circles to straight lines, so the planar hull of the projected points
 * (Andrew's monotone chain, Andrew 1979, Inf. Process. Lett. 9(5)) is the spherical hull.
 * O(n log n) overall (O(n) expected for the cap, O(n) radix sorting, O(n) chain).
 */
import { smallestEnclosingCap } from './smallest-enclosing-cap';
import { orderByKey } from './radix-order';

export const HULL_NONE_REASONS = [
  'fewer than three distinct positions',
  'all positions on one great circle',
  'positions do not fit in an open hemisphere',
] as const;

export type HullNoneReason = (typeof HULL_NONE_REASONS)[number];

export type ConvexHull =
  /** Vertex row indices, counter-clockwise seen from outside the sphere (RFC 7946 exterior
   * order), first vertex not repeated at the end. */
  | { readonly kind: 'hull'; readonly ring: Uint32Array }
  | { readonly kind: 'none'; readonly reason: HullNoneReason };

/**
 * Positions (unit vectors) within this distance of one plane through the centre (radians, about
 * 6 µm on the Earth) count as lying on one great circle.
 */
export const GREAT_CIRCLE_TOLERANCE = 1e-12;

/**
 * Convex hull along great circles of the positions given as unit vectors (interleaved
 * [x0, y0, z0, x1, …], as from degreesToUnitVectors, which gives equal places bit-identical
 * vectors).
 */
export function convexHull(xyz: Float64Array): ConvexHull {
  if (!hasThreeDistinct(xyz)) return none('fewer than three distinct positions');
  if (onOneGreatCircle(xyz)) return none('all positions on one great circle');
  const cap = smallestEnclosingCap(xyz);
  if (cap === null) return none('positions do not fit in an open hemisphere');

  // Gnomonic coordinates about the cap centre c in a right-handed frame (e1, e2, c), so that
  // counter-clockwise in the plane is counter-clockwise seen from outside the sphere.
  const cx = cap[0], cy = cap[1], cz = cap[2];
  let e1x = -cy, e1y = cx, e1z = 0; // z × c: east at c
  if (Math.abs(cz) > 0.9) { e1x = cz; e1y = 0; e1z = -cx; } // y × c near the poles
  const e1n = Math.sqrt(e1x * e1x + e1y * e1y + e1z * e1z);
  e1x /= e1n; e1y /= e1n; e1z /= e1n;
  const e2x = cy * e1z - cz * e1y, e2y = cz * e1x - cx * e1z, e2z = cx * e1y - cy * e1x;
  const n = xyz.length / 3;
  const gx = new Float64Array(n);
  const gy = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = xyz[3 * i], y = xyz[3 * i + 1], z = xyz[3 * i + 2];
    const h = x * cx + y * cy + z * cz;
    gx[i] = (x * e1x + y * e1y + z * e1z) / h;
    gy[i] = (x * e2x + y * e2y + z * e2z) / h;
  }
  const identity = new Uint32Array(n);
  for (let i = 0; i < n; i++) identity[i] = i;
  const sorted = orderByKey(gx, orderByKey(gy, identity));

  // Monotone chain: lower hull left to right, then upper hull right to left, dropping points
  // that do not turn left (collinear and repeated points included).
  const hull = new Uint32Array(2 * n);
  let size = 0;
  for (let k = 0; k < n; k++) {
    const p = sorted[k];
    while (size >= 2 && turn(xyz, hull[size - 2], hull[size - 1], p) <= 0) size--;
    hull[size++] = p;
  }
  for (let k = n - 2, lower = size + 1; k >= 0; k--) {
    const p = sorted[k];
    while (size >= lower && turn(xyz, hull[size - 2], hull[size - 1], p) <= 0) size--;
    hull[size++] = p;
  }
  size--; // the last point is the first again
  if (size < 3) return none('all positions on one great circle');
  return { kind: 'hull', ring: hull.slice(0, size) };
}

function none(reason: HullNoneReason): ConvexHull {
  return { kind: 'none', reason };
}

/**
 * det(a, b, c) = a · ((b − a) × (c − a)): positive when a → b → c turns left seen from outside.
 * The differences keep precision for nearby points, where b × c would cancel.
 */
function turn(xyz: Float64Array, a: number, b: number, c: number): number {
  const ax = xyz[3 * a], ay = xyz[3 * a + 1], az = xyz[3 * a + 2];
  const ux = xyz[3 * b] - ax, uy = xyz[3 * b + 1] - ay, uz = xyz[3 * b + 2] - az;
  const vx = xyz[3 * c] - ax, vy = xyz[3 * c + 1] - ay, vz = xyz[3 * c + 2] - az;
  return ax * (uy * vz - uz * vy) + ay * (uz * vx - ux * vz) + az * (ux * vy - uy * vx);
}

function hasThreeDistinct(xyz: Float64Array): boolean {
  const n = xyz.length / 3;
  let second = -1;
  for (let i = 1; i < n; i++) {
    if (sameVector(xyz, 0, i)) continue;
    if (second < 0) second = i;
    else if (!sameVector(xyz, second, i)) return true;
  }
  return false;
}

function sameVector(xyz: Float64Array, i: number, j: number): boolean {
  return xyz[3 * i] === xyz[3 * j] && xyz[3 * i + 1] === xyz[3 * j + 1] && xyz[3 * i + 2] === xyz[3 * j + 2];
}

/**
 * True when every vector lies within GREAT_CIRCLE_TOLERANCE of the plane through the centre
 * spanned by the first vector and the one most nearly perpendicular to it.
 */
function onOneGreatCircle(xyz: Float64Array): boolean {
  const n = xyz.length / 3;
  const ax = xyz[0], ay = xyz[1], az = xyz[2];
  let nx = 0, ny = 0, nz = 0, best = 0;
  for (let i = 1; i < n; i++) {
    const x = xyz[3 * i], y = xyz[3 * i + 1], z = xyz[3 * i + 2];
    const cx = ay * z - az * y, cy = az * x - ax * z, cz = ax * y - ay * x;
    const s = cx * cx + cy * cy + cz * cz;
    if (s > best) { best = s; nx = cx; ny = cy; nz = cz; }
  }
  if (best === 0) return true;
  const length = Math.sqrt(best);
  nx /= length; ny /= length; nz /= length;
  for (let i = 0; i < n; i++) {
    if (Math.abs(nx * xyz[3 * i] + ny * xyz[3 * i + 1] + nz * xyz[3 * i + 2]) > GREAT_CIRCLE_TOLERANCE) return false;
  }
  return true;
}
