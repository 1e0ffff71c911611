/**
 * The reconstruction loop over a run of rows: degrees → unit vector → 3×3 matrix → degrees,
 * with the conversions of src/sphere/unit-vectors.ts (exact reduction of the angle in degrees
 * before Math.sin and Math.cos; Math.atan2 on both angles back).
 */
import { DEGREES, writeUnitVector } from '../sphere';

/**
 * For rows start … end − 1 with group[j] ≥ 0 (j = row − start): the unit vector of
 * (lat, lon) turned by the row-major 3×3 matrix at matrices[9·group[j]], into xyz[3j …].
 * Rows with a negative group are skipped.
 */
export function rotateRowsInto(
  lat: Float64Array, lon: Float64Array, start: number, end: number, group: Int32Array, matrices: Float64Array, xyz: Float64Array,
): void {
  for (let i = start, j = 0, o = 0; i < end; i++, j++, o += 3) {
    const g = group[j];
    if (g < 0) continue;
    const m = 9 * g;
    writeUnitVector(lat[i], lon[i], xyz, o);
    const x = xyz[o], y = xyz[o + 1], z = xyz[o + 2];
    xyz[o] = matrices[m] * x + matrices[m + 1] * y + matrices[m + 2] * z;
    xyz[o + 1] = matrices[m + 3] * x + matrices[m + 4] * y + matrices[m + 5] * z;
    xyz[o + 2] = matrices[m + 6] * x + matrices[m + 7] * y + matrices[m + 8] * z;
  }
}

/** The inverse step: latitude and longitude in degrees (longitude in [−180, 180], 0 at the
 * poles) of xyz[3j …] — not necessarily of unit length — into outLat[start + j],
 * outLon[start + j], or NaN where group[j] is negative. */
export function degreesOfRowsInto(
  xyz: Float64Array, start: number, end: number, group: Int32Array, outLat: Float64Array, outLon: Float64Array,
): void {
  for (let i = start, j = 0, o = 0; i < end; i++, j++, o += 3) {
    if (group[j] < 0) {
      outLat[i] = Number.NaN;
      outLon[i] = Number.NaN;
    } else {
      const x = xyz[o], y = xyz[o + 1];
      outLat[i] = Math.atan2(xyz[o + 2], Math.sqrt(x * x + y * y)) * DEGREES;
      outLon[i] = Math.atan2(y, x) * DEGREES;
    }
  }
}
