/** Latitudinal extent of a set of positions. */
export interface LatitudeStats {
  /** Southernmost latitude, degrees (NaN when there are no positions). */
  readonly minDeg: number;
  /** Northernmost latitude, degrees (NaN when there are no positions). */
  readonly maxDeg: number;
  /** maxDeg − minDeg, degrees (0 for a single position, NaN for none). */
  readonly spanDeg: number;
}

/** Minimum, maximum and span of the latitudes (degrees). */
export function latitudeStats(latDeg: Float64Array): LatitudeStats {
  if (latDeg.length === 0) return { minDeg: NaN, maxDeg: NaN, spanDeg: NaN };
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < latDeg.length; i++) {
    const lat = latDeg[i];
    if (lat < min) min = lat;
    if (lat > max) max = lat;
  }
  return { minDeg: min, maxDeg: max, spanDeg: max - min };
}
