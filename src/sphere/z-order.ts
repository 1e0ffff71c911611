import { orderByKey } from './radix-order';

/**
 * Indices in Z-order of the points' coordinate ranks (ranks rather than values, because the
 * projection spreads the points over many orders of magnitude): consecutive points are then
 * mostly close, so each walk is short.
 */
export function zOrder(xy: Float64Array): Uint32Array {
  const n = xy.length / 2;
  const xs = new Float64Array(n), ys = new Float64Array(n);
  for (let i = 0; i < n; i++) { xs[i] = xy[2 * i]; ys[i] = xy[2 * i + 1]; }
  const identity = () => Uint32Array.from({ length: n }, (_, i) => i);
  const byX = orderByKey(xs, identity()), byY = orderByKey(ys, identity());
  const qx = new Uint32Array(n), qy = new Uint32Array(n);
  const scale = 65536 / Math.max(1, n);
  for (let k = 0; k < n; k++) { qx[byX[k]] = Math.floor(k * scale); qy[byY[k]] = Math.floor(k * scale); }
  const key = new Float64Array(n);
  for (let i = 0; i < n; i++) key[i] = interleave(qx[i]) * 2 + interleave(qy[i]);
  return orderByKey(key, identity());
}

/** Spreads the 16 low bits of v to the even bits of a 32-bit number. */
function interleave(v: number): number {
  v &= 0xffff;
  v = (v | (v << 8)) & 0x00ff00ff;
  v = (v | (v << 4)) & 0x0f0f0f0f;
  v = (v | (v << 2)) & 0x33333333;
  v = (v | (v << 1)) & 0x55555555;
  return v >>> 0;
}
