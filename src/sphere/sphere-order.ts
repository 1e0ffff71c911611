/**
 * An insertion order of points on the sphere for incremental triangulation, in two rounds after
 * Amenta, Choi & Rote's biased randomized insertion order (2003, Proc. 19th SoCG): first a random
 * sixteenth of the points, then the rest. The first round spans a coarse triangulation, so that
 * later points seldom fall at the edge of what is built, where an insertion flips the most.
 * Within a round the order is that of the Morton (Z-order) curve (Morton 1966) through a grid over the points' bounding box in 3-D, with about
 * one cell per point where the points lie: consecutive points are mostly close, so each
 * point-location walk is short. Working on the unit vectors rather than on a plane projection
 * keeps the grid even however the projection stretches distances. (A Hilbert curve, tried too,
 * made the walks no shorter here and its index costs more.)
 */
import { orderByBits } from './radix-order';

/** The listed indices of unit vectors [x0, y0, z0, x1, …], reordered in place along the curve. */
export function sphereOrder(xyz: Float64Array, indices: Uint32Array): Uint32Array {
  const m = indices.length;
  let x0 = Infinity, y0 = Infinity, z0 = Infinity, x1 = -Infinity, y1 = -Infinity, z1 = -Infinity;
  for (let k = 0; k < m; k++) {
    const i = indices[k];
    const x = xyz[3 * i], y = xyz[3 * i + 1], z = xyz[3 * i + 2];
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
    if (z < z0) z0 = z;
    if (z > z1) z1 = z;
  }
  // 2^bits cells along each axis: about m cells on a surface across the box (finer cells, tried,
  // made the walks no shorter).
  const bits = Math.min(MAX_BITS, Math.ceil(Math.log2(Math.max(m, 2)) / 2));
  const cells = 1 << bits;
  // Scales that send [min, max] into [0, cells), the top edge included.
  const sx = cells / ((x1 - x0) * (1 + 1e-9) || 1), sy = cells / ((y1 - y0) * (1 + 1e-9) || 1), sz = cells / ((z1 - z0) * (1 + 1e-9) || 1);
  const keys = new Uint32Array(m);
  for (let k = 0; k < m; k++) {
    const i = indices[k];
    const morton = spread((xyz[3 * i] - x0) * sx) | (spread((xyz[3 * i + 1] - y0) * sy) << 1) | (spread((xyz[3 * i + 2] - z0) * sz) << 2);
    keys[k] = inFirstRound(i) ? morton : morton | (1 << (3 * bits));
  }
  return orderByBits(keys, indices, 3 * bits + 1);
}

/**
 * One index in 16, spread evenly and fixed for the index: the low bits of the final avalanche
 * of MurmurHash3 (fmix32, Appleby 2011), which depend on every bit of the index.
 */
function inFirstRound(i: number): boolean {
  let h = i ^ (i >>> 16);
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return (h & 15) === 0;
}

/** Cells per axis up to 2^10, so that a key of three interleaved cell numbers and the round fits in 31 bits. */
const MAX_BITS = 10;

/** Spreads the 10 low bits of ⌊v⌋ (v ≥ 0) to every third bit (bits 0, 3, 6, …, 27). */
function spread(v: number): number {
  let x = v & 0x3ff;
  x = (x | (x << 16)) & 0x030000ff;
  x = (x | (x << 8)) & 0x0300f00f;
  x = (x | (x << 4)) & 0x030c30c3;
  x = (x | (x << 2)) & 0x09249249;
  return x;
}
