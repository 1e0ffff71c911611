import { canonicalLatitude, canonicalLongitude } from '../sphere/position-identity';
import { groupEqualTuples } from '../sphere/tuple-groups';

/** The distinct places of every slice (same place as in sphere/position-identity.ts). */
export interface SlicePositions {
  /** For each row (in slice order), its place numbered within its slice, 0, 1, … in first-seen order. */
  readonly codes: Uint32Array;
  /** The most distinct places any one slice has (the size a counter of codes needs). */
  readonly mostInOneSlice: number;
  /** Per slice, the distinct places' latitudes and longitudes (degrees), as first seen. */
  readonly lat: readonly Float64Array[];
  readonly lon: readonly Float64Array[];
}

/**
 * Numbers the places of each slice separately: rows of slice s are start[s] … start[s + 1] − 1
 * of `latDeg`/`lonDeg`. A hash table per slice stays small and in cache, where one table for a
 * million rows would not.
 */
export function slicePositions(latDeg: Float64Array, lonDeg: Float64Array, start: Uint32Array): SlicePositions {
  const codes = new Uint32Array(latDeg.length);
  const keys = new Float64Array(2 * latDeg.length);
  const lat: Float64Array[] = [];
  const lon: Float64Array[] = [];
  let mostInOneSlice = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    const from = start[s];
    const n = start[s + 1] - from;
    const sliceKeys = keys.subarray(0, 2 * n);
    for (let k = 0; k < n; k++) {
      sliceKeys[2 * k] = canonicalLatitude(latDeg[from + k]);
      sliceKeys[2 * k + 1] = canonicalLongitude(latDeg[from + k], lonDeg[from + k]);
    }
    const { count, first } = groupEqualTuples(sliceKeys, 2, codes.subarray(from, from + n));
    const sliceLat = new Float64Array(count);
    const sliceLon = new Float64Array(count);
    for (let g = 0; g < count; g++) {
      sliceLat[g] = latDeg[from + first[g]];
      sliceLon[g] = lonDeg[from + first[g]];
    }
    lat.push(sliceLat);
    lon.push(sliceLon);
    mostInOneSlice = Math.max(mostInOneSlice, count);
  }
  return { codes, mostInOneSlice, lat, lon };
}
