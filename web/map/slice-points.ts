/**
 * One slice's points from a PointSet, interleaved as [lon, lat] pairs for deck.gl's binary
 * getPosition attribute (which wants one buffer of size 2, not two columns).
 */
import type { IndicatorPoints, PointSet } from '../protocol';

/** Number of points slice `slice` owns. */
export function slicePointCount(points: PointSet, slice: number): number {
  return points.sliceStart[slice + 1] - points.sliceStart[slice];
}

/** [lon, lat] per point of the slice, degrees. */
export function slicePositions(points: PointSet, slice: number): Float32Array {
  const first = points.sliceStart[slice];
  const n = slicePointCount(points, slice);
  const out = new Float32Array(n * 2);
  for (let i = 0; i < n; i++) {
    out[i * 2] = points.lon[first + i];
    out[i * 2 + 1] = points.lat[first + i];
  }
  return out;
}

/** [r, g, b] per indicator site of the slice: palette[kind mod palette length]. */
export function sliceKindColours(
  indicators: IndicatorPoints, slice: number, palette: readonly (readonly [number, number, number])[],
): Uint8Array {
  const first = indicators.sliceStart[slice];
  const n = slicePointCount(indicators, slice);
  const out = new Uint8Array(n * 3);
  for (let i = 0; i < n; i++) out.set(palette[indicators.kind[first + i] % palette.length], i * 3);
  return out;
}
