import { canonicalLatitude, canonicalLongitude } from '../sphere/position-identity';
import { groupEqualTuples } from '../sphere/tuple-groups';
import { ABSENT_CODE } from '../table/occurrence-table';

/** Distinct positions numbered in first-seen order; rows with a NaN coordinate get ABSENT_CODE. */
export interface PositionCodes {
  readonly codes: Uint32Array;
  readonly count: number;
}

/**
 * Numbers the distinct places of a table (same place as in sphere/position-identity.ts: exact
 * degrees, with −180 = 180 and every longitude at a pole one place). Rows without a position
 * are left out of the numbering.
 */
export function positionCodes(latDeg: Float64Array, lonDeg: Float64Array): PositionCodes {
  const n = latDeg.length;
  const codes = new Uint32Array(n).fill(ABSENT_CODE);
  const rows = new Uint32Array(n);
  const keys = new Float64Array(2 * n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    const lat = latDeg[i];
    const lon = lonDeg[i];
    if (Number.isNaN(lat) || Number.isNaN(lon)) continue;
    keys[2 * m] = canonicalLatitude(lat);
    keys[2 * m + 1] = canonicalLongitude(lat, lon);
    rows[m++] = i;
  }
  const groupOf = new Uint32Array(m);
  const { count } = groupEqualTuples(keys.subarray(0, 2 * m), 2, groupOf);
  for (let k = 0; k < m; k++) codes[rows[k]] = groupOf[k];
  return { codes, count };
}
