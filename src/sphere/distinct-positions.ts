import { canonicalLatitude, canonicalLongitude } from './position-identity';
import { groupEqualTuples } from './tuple-groups';

/** Positions as columns of degrees. */
export interface Positions {
  readonly lat: Float64Array;
  readonly lon: Float64Array;
}

/**
 * The distinct places among the listed rows of `latDeg`/`lonDeg` (degrees), in order of first
 * appearance. Sameness is exact equality of the degree values, with lon −180 = 180 and any
 * longitude at lat ±90 the same pole (see position-identity.ts). Each place keeps the values of
 * its first row as given. Inputs must be finite (validated where the table is read).
 */
export function distinctPositions(latDeg: Float64Array, lonDeg: Float64Array, rows: Uint32Array): Positions {
  const m = rows.length;
  // Canonical values side by side, so that equal places have equal bits to hash.
  const keys = new Float64Array(2 * m);
  for (let k = 0; k < m; k++) {
    const r = rows[k];
    keys[2 * k] = canonicalLatitude(latDeg[r]);
    keys[2 * k + 1] = canonicalLongitude(latDeg[r], lonDeg[r]);
  }
  const { count, first } = groupEqualTuples(keys, 2);
  const lat = new Float64Array(count);
  const lon = new Float64Array(count);
  for (let g = 0; g < count; g++) {
    const r = rows[first[g]];
    lat[g] = latDeg[r];
    lon[g] = lonDeg[r];
  }
  return { lat, lon };
}
