/**
 * Positions in degrees ⇄ interleaved unit vectors [x0, y0, z0, x1, …] (x towards lat 0° lon 0°,
 * y towards lat 0° lon 90°E, z towards the north pole). Vectors are what the other kernels in
 * this folder work on; degrees only at the edges.
 */
import { DEGREES, RADIANS } from './earth';

/** Unit vectors of the positions (latitude, longitude in degrees), a new Float64Array(3n). */
export function degreesToUnitVectors(latDeg: Float64Array, lonDeg: Float64Array): Float64Array {
  return degreesToUnitVectorsInto(latDeg, lonDeg, new Float64Array(3 * latDeg.length));
}

/**
 * Writes the unit vectors of the positions into `out` (length ≥ 3n) and returns it.
 * Multiples of 90° give exact 0 and ±1, so both poles are exactly (0, 0, ±1) at any
 * longitude and longitudes −180° and 180° give the same vector.
 */
export function degreesToUnitVectorsInto(latDeg: Float64Array, lonDeg: Float64Array, out: Float64Array): Float64Array {
  for (let i = 0, n = latDeg.length; i < n; i++) writeUnitVector(latDeg[i], lonDeg[i], out, 3 * i);
  return out;
}

/** Writes the unit vector of one position (degrees) into out[offset … offset + 2]. */
export function writeUnitVector(latDeg: number, lonDeg: number, out: Float64Array, offset: number): void {
  const lat = turnOf(latDeg), lon = turnOf(lonDeg);
  const qLat = Math.round(lat / 90), qLon = Math.round(lon / 90);
  const rLat = (lat - 90 * qLat) * RADIANS, rLon = (lon - 90 * qLon) * RADIANS;
  const sLat = Math.sin(rLat), cLat = Math.cos(rLat), sLon = Math.sin(rLon), cLon = Math.cos(rLon);
  const cosLat = cosQuadrant(qLat, sLat, cLat);
  // + 0 turns −0 into 0, so that equal places give bit-identical vectors.
  out[offset] = cosLat * cosQuadrant(qLon, sLon, cLon) + 0;
  out[offset + 1] = cosLat * sinQuadrant(qLon, sLon, cLon) + 0;
  out[offset + 2] = sinQuadrant(qLat, sLat, cLat) + 0;
}

/**
 * The inverse of `degreesToUnitVectorsInto`: writes latitudes in [−90, 90] and longitudes in
 * [−180, 180] (degrees) of the vectors into `outLat`, `outLon`. atan2 on both angles keeps full
 * precision near the poles, where an arcsine of z would not. The vectors need not be exactly
 * unit length.
 */
export function unitVectorsToDegreesInto(xyz: Float64Array, outLat: Float64Array, outLon: Float64Array): void {
  for (let i = 0, n = outLat.length; i < n; i++) {
    const x = xyz[3 * i];
    const y = xyz[3 * i + 1];
    outLat[i] = Math.atan2(xyz[3 * i + 2], Math.sqrt(x * x + y * y)) * DEGREES;
    outLon[i] = Math.atan2(y, x) * DEGREES;
  }
}

// Sine and cosine of an angle in degrees, reduced exactly to r in [−45°, 45°] with
// deg = r + 90°·q before the radian conversion (as GeographicLib's sincosd, Karney 2013): the
// remainder modulo 360° is exact, and so is the subtraction, |result| ≤ 45°.

/** The angle modulo 360° (exact); the remainder is skipped when it would change nothing. */
function turnOf(deg: number): number {
  return Math.abs(deg) < 360 ? deg : deg % 360;
}

/** sin(90°·q + r) from s = sin r and c = cos r. */
function sinQuadrant(q: number, s: number, c: number): number {
  switch (q & 3) {
    case 0: return s;
    case 1: return c;
    case 2: return -s;
    default: return -c;
  }
}

/** cos(90°·q + r) from s = sin r and c = cos r. */
function cosQuadrant(q: number, s: number, c: number): number {
  switch (q & 3) {
    case 0: return c;
    case 1: return -s;
    case 2: return -c;
    default: return s;
  }
}
