/**
 * The reconstruction hot loop: degrees → unit vector → 3×3 matrix → degrees for a run of rows,
 * without calling Math.sin, Math.cos or Math.atan2 (10–25 ns each in V8, most of the time
 * budget). Same axes as src/sphere/unit-vectors.ts; results agree with it and with Math to
 * about 1e-15.
 *
 * - sin and cos: a table of whole degrees (built with the exact reduction of
 *   `writeUnitVector`) and the angle-addition formulas with the remainder r, |r| ≤ 0.5°, whose
 *   sine and cosine come from Taylor polynomials truncated below 1e-18.
 * - atan: a table of Taylor expansions about c = k/256, k = 0 … 256 (12 kB, within the first-
 *   level cache), on the octant-reduced ratio a ∈ [0, 1]: |a − c| ≤ 1/512, degree 5, truncation
 *   below (1/512)⁶/6 ≈ 1e-17 (each coefficient is at most 1/n in size, see below); a short
 *   polynomial keeps the chain of dependent multiplications short. The coefficients follow from
 *   atan′(x) = 1/(1 + x²) = Im 1/(x − i): the n-th derivative is (−1)ⁿ⁻¹ (n − 1)! Im (x − i)⁻ⁿ,
 *   and with x − i = ρ e^(−iφ), ρ = √(1 + x²), φ = arccot x, the n-th Taylor coefficient is
 *   (−1)ⁿ⁻¹ sin(nφ) / (n ρⁿ).
 */
import { DEGREES, RADIANS } from '../sphere/earth';
import { writeUnitVector } from '../sphere/unit-vectors';

// Module-local copies: transpiled to CommonJS (as tsx runs it), an imported name becomes a
// property read through a getter on every use, which the hot loops below cannot afford.
const TO_RADIANS = RADIANS;
const TO_DEGREES = DEGREES;

const WHOLE_DEGREES = 361; // −180 … 180
const SIN_WHOLE = new Float64Array(WHOLE_DEGREES);
const COS_WHOLE = new Float64Array(WHOLE_DEGREES);
{
  const v = new Float64Array(3);
  for (let k = 0; k < WHOLE_DEGREES; k++) {
    writeUnitVector(0, k - 180, v, 0);
    COS_WHOLE[k] = v[0];
    SIN_WHOLE[k] = v[1];
  }
}

const ATAN_STEPS = 256;
const ATAN_TERMS = 6; // atan(c) and 5 Taylor coefficients
const ATAN_TAYLOR = new Float64Array((ATAN_STEPS + 1) * ATAN_TERMS);
for (let k = 0; k <= ATAN_STEPS; k++) {
  const c = k / ATAN_STEPS, phi = Math.PI / 2 - Math.atan(c), rho = Math.sqrt(1 + c * c);
  ATAN_TAYLOR[k * ATAN_TERMS] = Math.atan(c);
  for (let n = 1; n < ATAN_TERMS; n++) ATAN_TAYLOR[k * ATAN_TERMS + n] = ((n & 1) === 1 ? 1 : -1) * Math.sin(n * phi) / (n * rho ** n);
}

// atan2 = OFFSET[o] + SCALE[o]·atan(min/max) for the octant o = (|y| > |x|) + 2(x < 0) + 4(y < 0):
// swapping gives π/2 − t, x < 0 gives π − that, y < 0 the negative.
const OCTANT_OFFSET = new Float64Array(8);
const OCTANT_SCALE = new Float64Array(8);
for (let o = 0; o < 8; o++) {
  const swapped = (o & 1) === 1, westward = (o & 2) === 2, southward = (o & 4) === 4;
  const a1 = swapped ? Math.PI / 2 : 0, b1 = swapped ? -1 : 1, a2 = westward ? Math.PI : 0, b2 = westward ? -1 : 1, s = southward ? -1 : 1;
  OCTANT_OFFSET[o] = s * (a2 + b2 * a1);
  OCTANT_SCALE[o] = s * b2 * b1;
}

/**
 * Writes the unit vector of (latDeg, lonDeg) into out[offset … offset + 2]. Expects latitude in
 * [−90, 90] and longitude in [−180, 180] (the table covers no more); multiples of 90° are exact.
 */
export function writeUnitVectorFast(latDeg: number, lonDeg: number, out: Float64Array, offset: number): void {
  // Nearest whole degree; the remainder deg − k is exact (Sterbenz: both within 0.5 of each other).
  let k = ((latDeg + 180.5) | 0) - 180;
  let r = (latDeg - k) * TO_RADIANS;
  let r2 = r * r;
  let s = r + r * r2 * (-1 / 6 + r2 * (1 / 120));
  let c = 1 + r2 * (-1 / 2 + r2 * (1 / 24 - r2 * (1 / 720)));
  const sinLat = SIN_WHOLE[k + 180] * c + COS_WHOLE[k + 180] * s;
  const cosLat = COS_WHOLE[k + 180] * c - SIN_WHOLE[k + 180] * s;
  k = ((lonDeg + 180.5) | 0) - 180;
  r = (lonDeg - k) * TO_RADIANS;
  r2 = r * r;
  s = r + r * r2 * (-1 / 6 + r2 * (1 / 120));
  c = 1 + r2 * (-1 / 2 + r2 * (1 / 24 - r2 * (1 / 720)));
  out[offset] = cosLat * (COS_WHOLE[k + 180] * c - SIN_WHOLE[k + 180] * s);
  out[offset + 1] = cosLat * (SIN_WHOLE[k + 180] * c + COS_WHOLE[k + 180] * s);
  out[offset + 2] = sinLat;
}

/** atan2(y, x) in radians, in [−π, π], within about 1e-15 of Math.atan2; 0 for (0, 0). */
export function atan2Fast(y: number, x: number): number {
  const ax = Math.abs(x), ay = Math.abs(y);
  const max = Math.max(ax, ay);
  if (max === 0) return 0;
  const a = Math.min(ax, ay) / max;
  const k = (ATAN_STEPS * a + 0.5) | 0;
  const h = a - k / ATAN_STEPS, t = k * ATAN_TERMS;
  const atan = ATAN_TAYLOR[t] + h * (ATAN_TAYLOR[t + 1] + h * (ATAN_TAYLOR[t + 2] + h * (ATAN_TAYLOR[t + 3] +
    h * (ATAN_TAYLOR[t + 4] + h * ATAN_TAYLOR[t + 5]))));
  const o = Number(ay > ax) + 2 * Number(x < 0) + 4 * Number(y < 0);
  return OCTANT_OFFSET[o] + OCTANT_SCALE[o] * atan;
}

/**
 * Writes the latitude and longitude in degrees of the vector (x, y, z) — not necessarily of unit
 * length — into outLat[i], outLon[i]; the inverse of `writeUnitVectorFast`. Longitude in
 * [−180, 180], 0 at the poles.
 */
export function writeDegreesFast(x: number, y: number, z: number, outLat: Float64Array, outLon: Float64Array, i: number): void {
  outLat[i] = atan2Fast(z, Math.sqrt(x * x + y * y)) * TO_DEGREES;
  outLon[i] = atan2Fast(y, x) * TO_DEGREES;
}

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
    writeUnitVectorFast(lat[i], lon[i], xyz, o);
    const x = xyz[o], y = xyz[o + 1], z = xyz[o + 2];
    xyz[o] = matrices[m] * x + matrices[m + 1] * y + matrices[m + 2] * z;
    xyz[o + 1] = matrices[m + 3] * x + matrices[m + 4] * y + matrices[m + 5] * z;
    xyz[o + 2] = matrices[m + 6] * x + matrices[m + 7] * y + matrices[m + 8] * z;
  }
}

/** The inverse step: degrees of xyz[3j …] into outLat[start + j], outLon[start + j], or NaN
 * where group[j] is negative. */
export function degreesOfRowsInto(
  xyz: Float64Array, start: number, end: number, group: Int32Array, outLat: Float64Array, outLon: Float64Array,
): void {
  for (let i = start, j = 0, o = 0; i < end; i++, j++, o += 3) {
    if (group[j] < 0) {
      outLat[i] = Number.NaN;
      outLon[i] = Number.NaN;
    } else {
      writeDegreesFast(xyz[o], xyz[o + 1], xyz[o + 2], outLat, outLon, i);
    }
  }
}
