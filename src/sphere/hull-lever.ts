/**
 * Leave-one-out on the spherical convex hull: which place's removal shrinks the hull most. Only a
 * hull vertex can shrink it (the hull of the rest still holds every other place). Removing vertex
 * v between its ring neighbours u and w cuts off the triangle (u, v, w) and gives back the hull of
 * u, w and the places strictly on v's side of the great circle through u and w (they all lie in
 * that triangle): area without v = area − triangle + that pocket's hull. So each vertex costs one
 * side test per place off the ring and a hull of its few pocket places, O(n·h) for h vertices,
 * instead of a hull of all the rest, O(h·n log n).
 */
import { GREAT_CIRCLE_TOLERANCE, convexHull } from './convex-hull';
import { polygonAreaKm2 } from './polygon-area';

export interface HullLever {
  /** Index of the place whose removal shrinks the hull most (ties: the lowest index); −1 when there is no hull. */
  readonly place: number;
  /** Hull area without that place, km²; NaN when no hull remains or there was none. */
  readonly withoutKm2: number;
}

const NO_LEVER: HullLever = { place: -1, withoutKm2: NaN };

/**
 * The hull lever of distinct places (unit vectors, xyz interleaved) whose hull ring is `ring`
 * (vertex indices in RFC 7946 order, as convexHull gives it), or NO_LEVER without a ring. A
 * removal that leaves no hull (three vertices and no place off the chord) shrinks the area to 0.
 */
export function hullLever(xyz: Float64Array, ring: Uint32Array | undefined): HullLever {
  if (ring === undefined) return NO_LEVER;
  const n = xyz.length / 3;
  const h = ring.length;
  const offRing = placesOffRing(n, ring);
  const areaKm2 = polygonAreaKm2(xyz, ring);
  const pocket = new Uint32Array(offRing.length + 2);
  const triangle = new Uint32Array(3);
  let best = -1;
  let bestShrink = -Infinity;
  let bestWithout = NaN;
  for (let k = 0; k < h; k++) {
    const u = ring[(k + h - 1) % h], v = ring[k], w = ring[(k + 1) % h];
    const size = pocketPlaces(xyz, u, w, offRing, pocket);
    const pocketKm2 = size > 2 ? hullAreaKm2(xyz, pocket.subarray(0, size)) : NaN;
    // Without v a hull remains unless every place left lies on the great circle through u and w:
    // three ring vertices with nothing off the chord, or a ring whose other vertices are all on it.
    const remains = size > 2 ? h > 3 || !Number.isNaN(pocketKm2) : h > 3 && !ringOnGreatCircle(xyz, ring, k, u, w);
    triangle[0] = u; triangle[1] = v; triangle[2] = w;
    const without = remains ? areaKm2 - polygonAreaKm2(xyz, triangle) + (Number.isNaN(pocketKm2) ? 0 : pocketKm2) : NaN;
    const shrink = areaKm2 - (remains ? without : 0);
    if (shrink > bestShrink || (shrink === bestShrink && v < best)) {
      best = v;
      bestShrink = shrink;
      bestWithout = without;
    }
  }
  return { place: best, withoutKm2: bestWithout };
}

function placesOffRing(n: number, ring: Uint32Array): Uint32Array {
  const onRing = new Uint8Array(n);
  for (let k = 0; k < ring.length; k++) onRing[ring[k]] = 1;
  const off = new Uint32Array(n - ring.length);
  for (let i = 0, m = 0; i < n; i++) if (onRing[i] === 0) off[m++] = i;
  return off;
}

/**
 * Writes u, w and the places strictly right of the great circle u → w (v's side) into `out`;
 * returns how many. The side test is (p − u)·(u × (w − u)) = det(u, w, p), with differences that
 * keep precision for nearby places (as in convex-hull.ts).
 */
function pocketPlaces(xyz: Float64Array, u: number, w: number, offRing: Uint32Array, out: Uint32Array): number {
  const ux = xyz[3 * u], uy = xyz[3 * u + 1], uz = xyz[3 * u + 2];
  const dx = xyz[3 * w] - ux, dy = xyz[3 * w + 1] - uy, dz = xyz[3 * w + 2] - uz;
  const nx = uy * dz - uz * dy, ny = uz * dx - ux * dz, nz = ux * dy - uy * dx;
  out[0] = u;
  out[1] = w;
  let size = 2;
  for (let k = 0; k < offRing.length; k++) {
    const p = offRing[k];
    if ((xyz[3 * p] - ux) * nx + (xyz[3 * p + 1] - uy) * ny + (xyz[3 * p + 2] - uz) * nz < 0) out[size++] = p;
  }
  return size;
}

/** Hull area of the places listed in `subset`, km²; NaN when they have no hull. */
function hullAreaKm2(xyz: Float64Array, subset: Uint32Array): number {
  const picked = new Float64Array(3 * subset.length);
  for (let k = 0; k < subset.length; k++) picked.set(xyz.subarray(3 * subset[k], 3 * subset[k] + 3), 3 * k);
  const hull = convexHull(picked);
  return hull.kind === 'hull' ? polygonAreaKm2(picked, hull.ring) : NaN;
}

/**
 * True when every ring vertex but the k-th lies within GREAT_CIRCLE_TOLERANCE of the great circle
 * through u and w (as convexHull judges a set to have no hull). Stops at the first vertex off it,
 * which on a hull with area is the one after w.
 */
function ringOnGreatCircle(xyz: Float64Array, ring: Uint32Array, k: number, u: number, w: number): boolean {
  const ux = xyz[3 * u], uy = xyz[3 * u + 1], uz = xyz[3 * u + 2];
  const wx = xyz[3 * w], wy = xyz[3 * w + 1], wz = xyz[3 * w + 2];
  let nx = uy * wz - uz * wy, ny = uz * wx - ux * wz, nz = ux * wy - uy * wx;
  const length = Math.hypot(nx, ny, nz);
  nx /= length; ny /= length; nz /= length;
  const h = ring.length;
  for (let step = 1; step < h; step++) {
    const p = ring[(k + step) % h];
    if (Math.abs(nx * xyz[3 * p] + ny * xyz[3 * p + 1] + nz * xyz[3 * p + 2]) > GREAT_CIRCLE_TOLERANCE) return false;
  }
  return true;
}
