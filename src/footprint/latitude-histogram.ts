/**
 * Counts of placed rows per palaeolatitude band, per slice and over all slices. Band b covers
 * [−90 + b·bandDeg, −90 + (b + 1)·bandDeg); the North Pole itself falls in the last band.
 */
export interface LatitudeHistogram {
  readonly bandDeg: number;
  readonly bands: number;
  /** Count per (slice, band) at slice · bands + band. */
  readonly perSlice: Uint32Array;
  /** Count per band over all slices. */
  readonly total: Uint32Array;
}

/**
 * `sliceOf[i]` is row i's slice (−1: not counted), `latDeg[i]` its palaeolatitude; `groups`
 * adds a second key (e.g. an indicator's kind): counts are then per (slice, group, band).
 */
export function latitudeHistogram(
  sliceOf: Int32Array, latDeg: Float64Array, sliceCount: number, bandDeg: number, groups?: { readonly of: ArrayLike<number>; readonly count: number },
): LatitudeHistogram {
  if (!(bandDeg > 0) || !Number.isInteger(180 / bandDeg)) throw new RangeError(`band width ${bandDeg}° must divide 180°`);
  const bands = 180 / bandDeg;
  const groupCount = groups?.count ?? 1;
  const perSlice = new Uint32Array(sliceCount * groupCount * bands);
  const total = new Uint32Array(groupCount * bands);
  for (let i = 0; i < sliceOf.length; i++) {
    const s = sliceOf[i];
    if (s < 0) continue;
    const band = Math.min(bands - 1, Math.floor((latDeg[i] + 90) / bandDeg));
    const group = groups === undefined ? 0 : groups.of[i];
    perSlice[(s * groupCount + group) * bands + band]++;
    total[group * bands + band]++;
  }
  return { bandDeg, bands, perSlice, total };
}
